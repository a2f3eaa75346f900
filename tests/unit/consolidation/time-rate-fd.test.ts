import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { olsonRampDegree } from '../../../src/lib/consolidation/ramp-loading';
import { degreeOfConsolidation } from '../../../src/lib/consolidation/terzaghi';
import { type FdZone, solveLayeredConsolidation } from '../../../src/lib/consolidation/time-rate-fd';

const tvGrid = Array.from({ length: 80 }, (_, i) => 10 ** (-4 + (i * Math.log10(4e4)) / 79));

/** Largest misfit against the Terzaghi series: relative for Tv ≥ 0.001, absolute below. */
function misfit(degrees: ArrayLike<number>, tvs: readonly number[], series: (tv: number) => number) {
  let relative = 0;
  let absolute = 0;
  tvs.forEach((tv, i) => {
    const diff = Math.abs((degrees[i] as number) - series(tv));
    if (tv >= 1e-3) relative = Math.max(relative, diff / series(tv));
    else absolute = Math.max(absolute, diff);
  });
  return { relative, absolute };
}

describe('Crank–Nicolson layered solver', () => {
  it('matches the Terzaghi series within 0.5 % over the whole curve for a single layer, both drainage cases (property)', () => {
    // source: Terzaghi (1943) series; the 0.5 % tolerance is our own accuracy target for the solver, not a published one
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 50, noNaN: true }),
        fc.double({ min: 1, max: 30, noNaN: true }),
        fc.boolean(),
        (cv, thickness, twoWay) => {
          const hdr = twoWay ? thickness / 2 : thickness;
          const zones: FdZone[] = [{ thicknessM: thickness, cvM2PerYear: cv, mvPerKpa: 1e-3, initialExcessKpa: 50, cells: 400 }];
          const result = solveLayeredConsolidation({
            zones,
            top: 'pervious',
            bottom: twoWay ? 'pervious' : 'impervious',
            loading: { kind: 'step' },
            timesYears: tvGrid.map((tv) => (tv * hdr * hdr) / cv),
          });
          const { relative, absolute } = misfit(result.zoneDegree, tvGrid, degreeOfConsolidation);
          return relative <= 0.005 && absolute <= 5e-4;
        },
      ),
      { seed: 42, numRuns: 12 },
    );
  });

  it('splits one layer into zones without changing the answer', () => {
    const times = [0.1, 1, 5, 20];
    const whole = solveLayeredConsolidation({
      zones: [{ thicknessM: 8, cvM2PerYear: 2, mvPerKpa: 5e-4, initialExcessKpa: 40, cells: 400 }],
      top: 'pervious',
      bottom: 'pervious',
      loading: { kind: 'step' },
      timesYears: times,
    });
    const split = solveLayeredConsolidation({
      zones: Array.from({ length: 4 }, () => ({
        thicknessM: 2,
        cvM2PerYear: 2,
        mvPerKpa: 5e-4,
        initialExcessKpa: 40,
        cells: 100,
      })),
      top: 'pervious',
      bottom: 'pervious',
      loading: { kind: 'step' },
      timesYears: times,
    });
    times.forEach((_, t) => {
      const mean = [0, 1, 2, 3].reduce((s, z) => s + (split.zoneDegree[t * 4 + z] as number), 0) / 4;
      expect(mean).toBeCloseTo(whole.zoneDegree[t] as number, 10);
    });
  });

  it('carries flow across a layer boundary: a free-draining top layer acts as a pervious boundary for the clay below', () => {
    // Interface check against the series for the clay alone (one-way drainage, Hdr = 6 m).
    const clay: FdZone = { thicknessM: 6, cvM2PerYear: 1.5, mvPerKpa: 1e-3, initialExcessKpa: 60, cells: 400 };
    const sand: FdZone = { thicknessM: 2, cvM2PerYear: 1e6, mvPerKpa: 1e-6, initialExcessKpa: 60, cells: 20 };
    const tvs = [0.005, 0.05, 0.2, 0.5, 1];
    const result = solveLayeredConsolidation({
      zones: [sand, clay],
      top: 'pervious',
      bottom: 'impervious',
      loading: { kind: 'step' },
      timesYears: tvs.map((tv) => (tv * 36) / 1.5),
    });
    tvs.forEach((tv, i) => {
      expect(result.zoneDegree[i * 2 + 1] as number).toBeCloseTo(degreeOfConsolidation(tv), 3);
    });
  });

  it('an almost impervious, incompressible bottom layer acts as an impervious base', () => {
    const clay: FdZone = { thicknessM: 5, cvM2PerYear: 3, mvPerKpa: 1e-3, initialExcessKpa: 60, cells: 400 };
    const rock: FdZone = { thicknessM: 3, cvM2PerYear: 1e-3, mvPerKpa: 1e-9, initialExcessKpa: 60, cells: 30 };
    const tvs = [0.01, 0.1, 0.4, 1];
    const result = solveLayeredConsolidation({
      zones: [clay, rock],
      top: 'pervious',
      bottom: 'pervious',
      loading: { kind: 'step' },
      timesYears: tvs.map((tv) => (tv * 25) / 3),
    });
    tvs.forEach((tv, i) => {
      expect(result.zoneDegree[i * 2] as number).toBeCloseTo(degreeOfConsolidation(tv), 3);
    });
  });

  it('with a time-varying (ramp) load matches Olson (1977) within 0.5 %', () => {
    // source: Olson (1977) J. Geotech. Eng. Div. 103(GT1); UFC 3-220-10 Fig. 5-20
    const cv = 2;
    const hdr = 5;
    const tcFactor = 0.4;
    const tvs = [0.02, 0.1, 0.3, 0.4, 0.6, 1, 2];
    const result = solveLayeredConsolidation({
      zones: [{ thicknessM: hdr, cvM2PerYear: cv, mvPerKpa: 1e-3, initialExcessKpa: 80, cells: 400 }],
      top: 'pervious',
      bottom: 'impervious',
      loading: { kind: 'ramp', durationYears: (tcFactor * hdr * hdr) / cv },
      timesYears: tvs.map((tv) => (tv * hdr * hdr) / cv),
    });
    tvs.forEach((tv, i) => {
      const olson = olsonRampDegree(tv, tcFactor);
      expect(Math.abs((result.zoneDegree[i] as number) - olson) / olson).toBeLessThan(0.005);
    });
  });
});
