import { quantileSorted } from 'd3-array';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { percentilesBySelection } from '../../../src/lib/statistics/order-statistics';
import { percentileSorted, weightedPercentilesOfRuns } from '../../../src/lib/statistics/percentiles';

const P = [0, 0.05, 0.1, 0.25, 0.5, 0.75, 0.9, 0.95, 1];
const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });

describe('type-7 percentiles', () => {
  it('1..10 at 0.1 is 1.9 and at 0.5 is 5.5', () => {
    // source: Hyndman & Fan (1996) type 7, R's default quantile(1:10, c(0.1, 0.5)) = 1.9, 5.5
    const values = Float64Array.from({ length: 10 }, (_, i) => i + 1);
    expect(percentileSorted(values, 0.1)).toBeCloseTo(1.9, 12);
    expect(percentileSorted(values, 0.5)).toBeCloseTo(5.5, 12);
  });

  it('by sorting and by selection both equal d3-array over random samples', () => {
    // source: d3-array 3.2.5 quantileSorted (R-7, an independent implementation)
    fc.assert(
      fc.property(fc.array(finite, { minLength: 1, maxLength: 300 }), (values) => {
        const sorted = Float64Array.from(values).sort();
        const selected = percentilesBySelection(Float64Array.from(values), P);
        P.forEach((p, i) => {
          const expected = quantileSorted(Array.from(sorted), p) as number;
          expect(percentileSorted(sorted, p)).toBeCloseTo(expected, 6);
          expect(selected[i]).toBeCloseTo(expected, 6);
        });
      }),
      { numRuns: 300 },
    );
  });

  it('selection handles many ties', () => {
    const values = Float64Array.from({ length: 1001 }, (_, i) => i % 3);
    expect(percentilesBySelection(values, [0.05, 0.5, 0.95])).toEqual([0, 1, 2]);
  });
});

describe('weighted percentiles (our type-7 generalisation)', () => {
  it('equal weights give type 7, however the values are split into runs', () => {
    fc.assert(
      fc.property(fc.array(finite, { minLength: 1, maxLength: 200 }), fc.integer({ min: 1, max: 5 }), (values, parts) => {
        const runs = Array.from({ length: parts }, (_, r) => ({
          values: Float64Array.from(values.filter((_, i) => i % parts === r)).sort(),
          weight: 0.5,
        }));
        const sorted = Array.from(Float64Array.from(values).sort());
        const got = weightedPercentilesOfRuns(runs, P);
        P.forEach((p, i) => {
          expect(got[i]).toBeCloseTo(quantileSorted(sorted, p) as number, 6);
        });
      }),
      { numRuns: 200 },
    );
  });

  it('places each value at the cumulative weight below it over that below the last', () => {
    // Hand computation: values 1 (w 1), 2 (w 3), 3 (w 1). Positions p = W(before)/W(before last) = 0, 1/4, 1.
    // P50: between 2 (at 0.25) and 3 (at 1): 2 + (0.5 − 0.25)/0.75 = 2.3333…
    const runs = [
      { values: Float64Array.of(2), weight: 3 },
      { values: Float64Array.of(1, 3), weight: 1 },
    ];
    const [p0, p10, p50, p100] = weightedPercentilesOfRuns(runs, [0, 0.1, 0.5, 1]);
    expect(p0).toBe(1);
    expect(p10).toBeCloseTo(1.4, 12);
    expect(p50).toBeCloseTo(2 + 1 / 3, 12);
    expect(p100).toBe(3);
  });

  it('a single value is every percentile', () => {
    expect(weightedPercentilesOfRuns([{ values: Float64Array.of(7), weight: 2 }], [0.1, 0.9])).toEqual([7, 7]);
  });
});
