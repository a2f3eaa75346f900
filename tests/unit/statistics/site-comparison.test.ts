import { describe, expect, it } from 'vitest';
import { columnsFromRecords, compareSiteValues, statisticsContext, summariseParameter } from '../../../src/lib/statistics';
import { simulatedRecords } from './support/simulated-selection';

describe('comparing site results with a deposit', () => {
  const context = statisticsContext(columnsFromRecords(simulatedRecords({ seed: 12, count: 2000 })), { viewerFirmId: 'firm-0' });

  it.each(['compressionIndex', 'cvNcM2PerYear'] as const)(
    '%s: values at the released P10, P50 and P90 read as those percentiles',
    (key) => {
      const pooled = summariseParameter(context, key).pooled;
      if (!pooled.released) throw new Error('expected release');
      const comparison = compareSiteValues(context, key, [pooled.p10, pooled.p50, pooled.p90]);
      expect(comparison.basis).toBe('pooled');
      const percentiles = comparison.results.map((r) => r?.percentile as number);
      // source: definition of a percentile; ±2.5 points allows for the masking and the mid-rank convention
      expect(Math.abs((percentiles[0] as number) - 10)).toBeLessThan(2.5);
      expect(Math.abs((percentiles[1] as number) - 50)).toBeLessThan(2.5);
      expect(Math.abs((percentiles[2] as number) - 90)).toBeLessThan(2.5);
    },
  );

  it('flags a value far beyond the fences', () => {
    const [far] = compareSiteValues(context, 'compressionIndex', [5]).results;
    expect(far?.outlier).toBe('high');
  });

  it('below the rule compares with the viewer’s own tests and says why', () => {
    const few = statisticsContext(columnsFromRecords(simulatedRecords({ seed: 12, count: 12, firmShares: [1] })), {
      viewerFirmId: 'firm-0',
    });
    const comparison = compareSiteValues(few, 'compressionIndex', [0.5]);
    expect(comparison.basis).toBe('own');
    expect(comparison.results[0]?.poolSize).toBe(12);
    expect(comparison.withheld?.reasons[0]?.code).toBe('TOO_FEW_FIRMS');
  });
});
