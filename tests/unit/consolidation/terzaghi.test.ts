import fc from 'fast-check';
import { describe, expect, it, test } from 'vitest';
import {
  degreeAtTime,
  degreeOfConsolidation,
  drainagePathM,
  integratedDegree,
  timeFactor,
  timeFactorForDegree,
  timeForDegreeYears,
} from '../../../src/lib/consolidation/terzaghi';

// source: Terzaghi (1943) Theoretical Soil Mechanics, exact series U = 1 − Σ(2/M²)·exp(−M²Tv), M = π(2m+1)/2;
// Tv = cv·t/Hdr², UFC 3-220-10 (2022) Eq. 5-15, curve in Fig. 5-16. Check values: that series summed and
// inverted with mpmath 1.3 (arbitrary precision, 30 digits), rounded; they agree with the three-figure U–Tv
// table printed in soil-mechanics textbooks (T50 = 0.197, T90 = 0.848; from memory).
const tvForU: Array<[number, number]> = [
  [10, 0.0079],
  [20, 0.0314],
  [30, 0.0707],
  [40, 0.1257],
  [50, 0.1967],
  [60, 0.2864],
  [70, 0.4029],
  [80, 0.5672],
  [90, 0.8481],
  [95, 1.129],
  [99, 1.7813],
];

const uForTv: Array<[number, number]> = [
  [0.01, 11.284],
  [0.05, 25.231],
  [0.1, 35.682],
  [0.2, 50.409],
  [0.3, 61.324],
  [0.5, 76.395],
  [0.7, 85.589],
  [1.0, 93.126],
  [1.5, 97.998],
  [2.0, 99.417],
];

describe('Terzaghi average degree of consolidation', () => {
  test.each(uForTv)('Tv = %f gives U = %f percent', (tv, uPercent) => {
    expect(100 * degreeOfConsolidation(tv)).toBeCloseTo(uPercent, 3);
  });

  test.each(tvForU)('U = %f percent needs Tv = %f', (uPercent, tv) => {
    expect(timeFactorForDegree(uPercent / 100)).toBeCloseTo(tv, 4);
  });

  it('gives T50 = 0.1967 and T90 = 0.8481', () => {
    // source: Terzaghi (1943) series evaluated with mpmath 1.3: T50 = 0.196731, T90 = 0.848085
    expect(timeFactorForDegree(0.5)).toBeCloseTo(0.19673, 5);
    expect(timeFactorForDegree(0.9)).toBeCloseTo(0.84809, 5);
  });

  test.each([10, 20, 30, 40, 50])('agrees with Casagrande/Taylor Tv = (π/4)U² within 0.0004 at U = %d percent', (uPercent) => {
    // source: UFC 3-220-10 (2022) Fig. 5-16, closed form Tv = (π/4)U² for U < 60 % (Casagrande and Taylor, from
    // memory); largest gap to the exact series 0.00038 at U = 50 % (series evaluated with mpmath 1.3)
    const u = uPercent / 100;
    expect(Math.abs(timeFactorForDegree(u) - (Math.PI / 4) * u * u)).toBeLessThanOrEqual(0.0004);
  });

  test.each([60, 70, 80, 90, 95, 99])(
    'agrees with Tv = 1.781 − 0.933·log10(100 − U) within 0.0004 at U = %d percent',
    (uPercent) => {
      // source: closed form for U ≥ 60 % as printed in soil-mechanics textbooks (from memory), the line drawn in
      // UFC 3-220-10 (2022) Fig. 5-16; largest gap to the exact series 0.00029 at U = 99 % (mpmath 1.3)
      expect(Math.abs(timeFactorForDegree(uPercent / 100) - (1.781 - 0.933 * Math.log10(100 - uPercent)))).toBeLessThanOrEqual(
        0.0004,
      );
    },
  );

  it('meets the series to 1e-9 where the small-Tv form takes over', () => {
    // Independent check: the Fourier series summed to 200 000 terms just below the switch at Tv = 0.05.
    const tv = 0.049;
    let remaining = 0;
    for (let m = 0; m < 200_000; m++) {
      const M = (Math.PI * (2 * m + 1)) / 2;
      remaining += (2 / (M * M)) * Math.exp(-M * M * tv);
    }
    expect(Math.abs(degreeOfConsolidation(tv) - (1 - remaining))).toBeLessThan(1e-9);
  });

  it('is 0 at Tv = 0 and 1 at very large Tv; the inverse is 0 and Infinity there', () => {
    expect(degreeOfConsolidation(0)).toBe(0);
    expect(degreeOfConsolidation(50)).toBe(1);
    expect(timeFactorForDegree(0)).toBe(0);
    expect(timeFactorForDegree(1)).toBe(Number.POSITIVE_INFINITY);
  });

  it('increases with Tv from 0 towards 1 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-8, max: 5, noNaN: true }), fc.double({ min: 1e-8, max: 5, noNaN: true }), (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const uLo = degreeOfConsolidation(lo);
        const uHi = degreeOfConsolidation(hi);
        return uLo > 0 && uHi < 1 + 1e-15 && uLo <= uHi;
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('inverts itself: U(Tv(U)) = U (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 0.999, noNaN: true }),
        (u) => Math.abs(degreeOfConsolidation(timeFactorForDegree(u)) - u) < 1e-10,
      ),
      { seed: 42, numRuns: 200 },
    );
  });

  it('integrates U over time consistently with the series (Simpson in w = √T, 4000 panels)', () => {
    for (const tv of [0.02, 0.2, 1, 3]) {
      const panels = 4000;
      const top = Math.sqrt(tv);
      const h = top / panels;
      const f = (w: number) => 2 * w * degreeOfConsolidation(w * w);
      let sum = f(0) + f(top);
      for (let i = 1; i < panels; i++) sum += (i % 2 ? 4 : 2) * f(i * h);
      expect(integratedDegree(tv)).toBeCloseTo((sum * h) / 3, 9);
    }
  });
});

describe('drainage path and time', () => {
  it('uses the thickness for one-way and half of it for two-way drainage', () => {
    // source: UFC 3-220-10 §5-5.3
    expect(drainagePathM(8, 'pervious', 'impervious')).toBe(8);
    expect(drainagePathM(8, 'impervious', 'pervious')).toBe(8);
    expect(drainagePathM(8, 'pervious', 'pervious')).toBe(4);
    expect(() => drainagePathM(8, 'impervious', 'impervious')).toThrow(RangeError);
  });

  it('turns cv and Hdr into time: 5 m drainage path, cv = 2 m²/yr, U = 90 % → t = 0.8481·25/2 years', () => {
    // source: Tv = cv·t/Hdr², UFC 3-220-10 (2022) Eq. 5-15; T90 = 0.8481, T50 = 0.1967 from the Terzaghi (1943)
    // series (values above)
    expect(timeFactor(2, 1, 5)).toBeCloseTo(0.08, 12);
    expect(timeForDegreeYears(0.9, 2, 5)).toBeCloseTo((0.8481 * 25) / 2, 3);
    expect(degreeAtTime((0.1967 * 25) / 2, 2, 5)).toBeCloseTo(0.5, 4);
  });
});
