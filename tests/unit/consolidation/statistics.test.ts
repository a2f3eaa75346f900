import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tenFiftyNinety } from '../../../src/lib/consolidation/percentiles';
import { midRanks, rankDrivers } from '../../../src/lib/consolidation/sensitivity';

/** Type-7 quantile by a full sort (Hyndman & Fan 1996), the independent reference. */
function sortedQuantile(values: number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  const h = (s.length - 1) * p;
  const k = Math.floor(h);
  return (s[k] as number) + (h - k) * ((s[Math.min(k + 1, s.length - 1)] as number) - (s[k] as number));
}

describe('percentiles', () => {
  it('equal the type-7 quantiles of the sorted values (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 300 }), (values) => {
        const q = tenFiftyNinety(values);
        return (
          q.p10 === sortedQuantile(values, 0.1) && q.p50 === sortedQuantile(values, 0.5) && q.p90 === sortedQuantile(values, 0.9)
        );
      }),
      { seed: 42, numRuns: 200 },
    );
  });

  it('handles ties and gives 2, 5.5 and 9 for 1…10', () => {
    // source: Hyndman & Fan (1996) type 7 on 1…10 (R quantile default): 1.9, 5.5, 9.1
    const q = tenFiftyNinety([3, 1, 4, 10, 5, 9, 2, 6, 8, 7]);
    expect(q.p10).toBeCloseTo(1.9, 12);
    expect(q.p50).toBeCloseTo(5.5, 12);
    expect(q.p90).toBeCloseTo(9.1, 12);
    expect(tenFiftyNinety([2, 2, 2, 2])).toEqual({ p10: 2, p50: 2, p90: 2 });
  });
});

describe('Spearman drivers', () => {
  it('gives mid-ranks with ties averaged', () => {
    const out = new Float64Array(5);
    midRanks(Float64Array.from([10, 20, 20, 30, 5]), new Float64Array(5), out);
    expect(Array.from(out)).toEqual([2, 3.5, 3.5, 5, 1]);
  });

  it('ranks a monotone driver first with ρ = ±1 and an unrelated input near 0', () => {
    const n = 2000;
    const x = Float64Array.from(
      { length: n },
      (_, i) => Math.sin(i * 12.9898) * 43758.5453 - Math.floor(Math.sin(i * 12.9898) * 43758.5453),
    );
    const noise = Float64Array.from({ length: n }, (_, i) => (i * 0.618033988749895) % 1);
    const output = Float64Array.from(x, (v) => Math.exp(3 * v));
    const inverse = Float64Array.from(x, (v) => 1 / (1 + v));
    const [drivers = []] = rankDrivers(
      [
        { layer: 'A', parameter: 'noise', values: noise },
        { layer: 'A', parameter: 'x', values: x },
        { layer: 'A', parameter: '1/x', values: inverse },
      ],
      [output],
    );
    expect(drivers[0]?.rankCorrelation).toBeCloseTo(1, 12);
    expect(drivers[1]?.rankCorrelation).toBeCloseTo(-1, 12);
    expect(Math.abs(drivers[2]?.rankCorrelation ?? 1)).toBeLessThan(0.1);
    expect(drivers.reduce((s, d) => s + d.share, 0)).toBeCloseTo(1, 12);
  });
});
