import fc from 'fast-check';
import { describe, expect, it, test } from 'vitest';
import { excessPorePressureRatio } from '../../../src/lib/consolidation/isochrones';
import { degreeOfConsolidation } from '../../../src/lib/consolidation/terzaghi';

// source: Terzaghi (1943) Theoretical Soil Mechanics, isochrones u/u0 = Σ(2/M)·sin(MZ)·exp(−M²Tv), charted in
// UFC 3-220-10 (2022) Fig. 5-17. Values: that series summed with mpmath 1.3 (30 digits) at Z = 0.25, 0.5,
// 0.75, 1.0, rounded to 4 decimals.
const isochrones: Array<[number, [number, number, number, number]]> = [
  [0.1, [0.4238, 0.7357, 0.9013, 0.9493]],
  [0.2, [0.3021, 0.5532, 0.7162, 0.7723]],
  [0.5, [0.1419, 0.2622, 0.3426, 0.3708]],
  [1.0, [0.0413, 0.0764, 0.0998, 0.108]],
];

describe('excess pore pressure isochrones', () => {
  test.each(isochrones)('Tv = %f', (tv, values) => {
    [0.25, 0.5, 0.75, 1].forEach((z, i) => {
      expect(excessPorePressureRatio(z, tv)).toBeCloseTo(values[i] as number, 4);
    });
  });

  it('is zero at the drainage face and symmetric about Z = 1 for two-way drainage', () => {
    expect(excessPorePressureRatio(0, 0.3)).toBe(0);
    expect(excessPorePressureRatio(2, 0.3)).toBe(0);
    expect(excessPorePressureRatio(0.4, 0.3)).toBeCloseTo(excessPorePressureRatio(1.6, 0.3), 12);
  });

  it('averages over the layer to 1 − U (Simpson over Z, 2000 panels)', () => {
    // Independent check of the isochrones against the average-degree series (both Terzaghi 1943).
    for (const tv of [0.01, 0.04, 0.1, 0.6]) {
      const panels = 2000;
      const h = 1 / panels;
      let sum = excessPorePressureRatio(0, tv) + excessPorePressureRatio(1, tv);
      for (let i = 1; i < panels; i++) sum += (i % 2 ? 4 : 2) * excessPorePressureRatio(i * h, tv);
      expect((sum * h) / 3).toBeCloseTo(1 - degreeOfConsolidation(tv), 5);
    }
  });

  it('gives the same values from the erfc form and a long Fourier series at small Tv (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.049, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }), (tv, z) => {
        let fourier = 0;
        for (let m = 0; m < 4000; m++) {
          const M = (Math.PI * (2 * m + 1)) / 2;
          fourier += (2 / M) * Math.sin(M * z) * Math.exp(-M * M * tv);
        }
        return Math.abs(excessPorePressureRatio(z, tv) - fourier) < 1e-9;
      }),
      { seed: 42, numRuns: 100 },
    );
  });
});
