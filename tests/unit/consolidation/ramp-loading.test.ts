import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { olsonRampDegree, rampFromStep } from '../../../src/lib/consolidation/ramp-loading';
import { degreeOfConsolidation } from '../../../src/lib/consolidation/terzaghi';

/** Independent Duhamel integral (1/Tc)∫U(s)ds over the loading window by Simpson in w = √(s − a). */
function duhamel(tv: number, tc: number): number {
  const a = Math.max(0, tv - tc);
  const top = Math.sqrt(tv - a);
  const panels = 2000;
  const h = top / panels;
  const f = (w: number) => 2 * w * degreeOfConsolidation(a + w * w);
  let sum = f(0) + f(top);
  for (let i = 1; i < panels; i++) sum += (i % 2 ? 4 : 2) * f(i * h);
  return (sum * h) / 3 / tc;
}

describe('ramp loading (Olson 1977)', () => {
  it("matches Duhamel's integral of the instantaneous-load series during and after construction", () => {
    // source: Olson (1977) series; UFC 3-220-10 Fig. 5-20 — checked against an independent numerical integral
    for (const [tv, tc] of [
      [0.05, 0.5],
      [0.3, 0.5],
      [0.5, 0.5],
      [0.9, 0.5],
      [2, 1],
      [0.4, 0.01],
    ] as const) {
      expect(olsonRampDegree(tv, tc)).toBeCloseTo(duhamel(tv, tc), 7);
    }
  });

  it('stays below T/Tc during construction (the load is not all on yet)', () => {
    expect(olsonRampDegree(0.2, 1)).toBeLessThan(0.2);
  });

  it('approaches the instantaneous case with the load placed at mid-construction long after construction', () => {
    // common practice: Terzaghi's (1943) correction — time counted from half the construction period (from memory)
    expect(olsonRampDegree(1.5, 0.4)).toBeCloseTo(degreeOfConsolidation(1.5 - 0.2), 2);
  });

  it('tends to the instantaneous case as the construction time tends to 0 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.005, max: 3, noNaN: true }), fc.double({ min: 1e-3, max: 1, noNaN: true }), (tv, tc) => {
        const shorter = olsonRampDegree(tv, tc / 10);
        const longer = olsonRampDegree(tv, tc);
        const instant = degreeOfConsolidation(tv);
        return shorter >= longer - 1e-12 && instant >= shorter - 1e-12 && Math.abs(olsonRampDegree(tv, 1e-7) - instant) < 1e-4;
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('builds the same curve from any step response by 16-point Gauss–Legendre superposition', () => {
    for (const [tv, tc] of [
      [0.1, 0.5],
      [0.7, 0.5],
      [3, 2],
    ] as const) {
      expect(rampFromStep(degreeOfConsolidation, tv, tc)).toBeCloseTo(olsonRampDegree(tv, tc), 6);
    }
  });
});
