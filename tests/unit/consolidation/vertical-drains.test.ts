import { describe, expect, it, test } from 'vitest';
import {
  bandDrainDiameter,
  barronSpacingFunction,
  barronSpacingFunctionApprox,
  carrilloCombined,
  hansboDrainFactor,
  influenceDiameterM,
  radialDegree,
  wellResistanceMean,
} from '../../../src/lib/consolidation/vertical-drains';

// source: Barron (1948) Trans. ASCE 113:718–742, F(n) = n²/(n² − 1)·ln n − (3n² − 1)/(4n²), and its
// approximation ln n − 0.75 (UFC 3-220-10 (2022) Eq. 5-23); both evaluated with mpmath 1.3, rounded to 4 decimals.
const barron: Array<[number, number, number]> = [
  [5, 0.9365, 0.8594],
  [10, 1.5783, 1.5526],
  [20, 2.2539, 2.2457],
  [40, 2.9413, 2.9389],
];

describe('vertical drains', () => {
  test.each(barron)('F(n) at n = %d is %f exact and %f approximate', (n, exact, approx) => {
    expect(barronSpacingFunction(n)).toBeCloseTo(exact, 4);
    expect(barronSpacingFunctionApprox(n)).toBeCloseTo(approx, 4);
  });

  it('uses de = 1.128·S (square) and 1.05·S (triangular)', () => {
    // source: equal plan area per drain, Barron (1948); Hansbo (1981) quotes 1.13 S and 1.05 S (from memory).
    // Worked by hand: π·de²/4 = S² → de = 2S/√π = 1.1284 S; π·de²/4 = (√3/2)·S² → de = S·√(2√3/π) = 1.0501 S
    expect(influenceDiameterM(2, 'square') / 2).toBeCloseTo(1.128, 3);
    expect(influenceDiameterM(2, 'triangular') / 2).toBeCloseTo(1.05, 3);
  });

  it('converts a 100 × 4 mm band drain to dw = 2(a+b)/π = 66.2 mm', () => {
    // source: Hansbo (1979) equivalent diameter, as in UFC 3-220-10 §5-6; worked by hand 208/π
    expect(bandDrainDiameter(100, 4)).toBeCloseTo(66.21, 2);
  });

  it('gives Ur = 1 − exp(−8Th/F): ch = 3 m²/yr, t = 0.5 yr, de = 1.5 m, F = 2 → 0.9305', () => {
    // source: UFC 3-220-10 Eq. 5-22 (Barron 1948); worked by hand: Th = 0.6667, Ur = 1 − e^(−2.6667)
    expect(radialDegree(3, 0.5, 1.5, 2)).toBeCloseTo(0.9305, 4);
    expect(radialDegree(3, 0, 1.5, 2)).toBe(0);
  });

  it('combines Uz = 30 % and Ur = 60 % into 72 % (Carrillo)', () => {
    // source: Carrillo (1942); UFC 3-220-10 Eq. 5-27: 100 − (100 − 30)(100 − 60)/100 = 72
    expect(carrilloCombined(0.3, 0.6)).toBeCloseTo(0.72, 12);
  });

  it("reduces Hansbo's μ to ln n − 0.75 without smear or well resistance, and adds the smear term", () => {
    // source: Hansbo (1981) μ = ln(n/s) + (kh/ks)·ln s − 0.75 + Fr (from memory); worked by hand for n = 20, s = 2, kh/ks = 3
    expect(hansboDrainFactor({ spacingRatio: 20, smearRatio: 1, khOverKs: 5, wellResistance: 0 })).toBeCloseTo(
      barronSpacingFunctionApprox(20),
      12,
    );
    expect(hansboDrainFactor({ spacingRatio: 20, smearRatio: 2, khOverKs: 3, wellResistance: 0 })).toBeCloseTo(3.632027, 6);
  });

  it('averages the well resistance π·z(2l − z)·kh/qw over the drain length', () => {
    // Independent check: Simpson average of the Hansbo (1981) point value over 0 ≤ z ≤ l.
    const l = 10;
    const kh = 0.03;
    const qw = 100;
    const panels = 1000;
    const h = l / panels;
    const f = (z: number) => (Math.PI * z * (2 * l - z) * kh) / qw;
    let sum = f(0) + f(l);
    for (let i = 1; i < panels; i++) sum += (i % 2 ? 4 : 2) * f(i * h);
    expect(wellResistanceMean(l, kh, qw)).toBeCloseTo((sum * h) / 3 / l, 10);
  });
});
