import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { indexStrain } from '../../../src/lib/consolidation/settlement-primary';
import { divideLayers, refineUntilConverged } from '../../../src/lib/consolidation/sublayers';

describe('sublayers', () => {
  it('divides layers into equal sublayers with mid-points, skipping layers with a count of 0', () => {
    const subs = divideLayers([2, 3, 4], [2, 0, 4]);
    expect(subs.map((s) => [s.layerIndex, s.topM, s.midM, s.bottomM])).toEqual([
      [0, 0, 0.5, 1],
      [0, 1, 1.5, 2],
      [2, 5, 5.5, 6],
      [2, 6, 6.5, 7],
      [2, 7, 7.5, 8],
      [2, 8, 8.5, 9],
    ]);
  });

  /** Settlement of an NC clay (top at depth d, submerged weight γ′) under a wide fill, by mid-points. */
  const settlement = (counts: number[], d: number, thickness: number, gammaPrime: number, q: number) =>
    divideLayers([d, thickness], counts).reduce((sum, s) => {
      const sigma = 20 * d + gammaPrime * (s.midM - d);
      return sum + indexStrain(0.9, 0.09, 2, sigma, q, sigma).strain * s.thicknessM;
    }, 0);

  it('converges on the integral of the settlement, and the refinement reports its counts (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 5, max: 10, noNaN: true }),
        fc.double({ min: 10, max: 200, noNaN: true }),
        (d, thickness, gammaPrime, q) => {
          const total = (counts: number[]) => settlement(counts, d, thickness, gammaPrime, q);
          const result = refineUntilConverged([false, true], total, 0.5, 512);
          const fine = total([0, 20000]);
          const errors = [1, 2, 4, 8, 16].map((n) => Math.abs(total([0, n]) - fine));
          const shrinking = errors.every((e, i) => i === 0 || e <= (errors[i - 1] as number) + 1e-15);
          return (
            result.converged &&
            result.countsPerLayer[0] === 0 &&
            Math.abs(result.totalM - fine) / fine < 0.005 &&
            result.changePercent < 0.5 &&
            shrinking
          );
        },
      ),
      { seed: 42, numRuns: 100 },
    );
  });

  it('reports when it stops at the limit before converging', () => {
    const result = refineUntilConverged([true], (counts) => 1 / (counts[0] ?? 1), 0.5, 8);
    expect(result.converged).toBe(false);
    expect(result.countsPerLayer).toEqual([8]);
  });
});
