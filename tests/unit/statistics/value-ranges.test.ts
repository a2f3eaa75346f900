import { describe, expect, it } from 'vitest';
import {
  columnsFromRecords,
  filterByValueRanges,
  PARAMETERS,
  statisticsContext,
  summariseParameter,
} from '../../../src/lib/statistics';
import { maskFactor } from '../../../src/lib/statistics/masking';
import { simulatedRecords } from './support/simulated-selection';

describe('numeric range filters', () => {
  const records = simulatedRecords({ seed: 31, count: 200 });
  const columns = columnsFromRecords(records);

  it('keep other firms’ tests by masked value and the viewer’s own by true value', () => {
    const filtered = filterByValueRanges(columns, { compressionIndex: { min: 0.5, max: 0.7 }, depthM: { max: 20 } }, 'firm-0');
    const expected = records.filter((r) => {
      const cc = r.compressionIndex as number;
      const seen = r.firmId === 'firm-0' ? cc : cc * maskFactor(r.recordKey, PARAMETERS.compressionIndex);
      return seen >= 0.5 && seen <= 0.7 && r.depthM <= 20;
    });
    expect(filtered.length).toBe(expected.length);
    expect(Array.from(filtered.values.compressionIndex ?? [])).toEqual(expected.map((r) => r.compressionIndex));
  });

  it('the count steps at another firm’s masked value, not at its true value, so bisection reads back only the mask', () => {
    const target = records.find((r) => r.firmId === 'firm-1');
    if (!target) throw new Error('no target');
    const count = (v: number) => {
      const context = statisticsContext(filterByValueRanges(columns, { compressionIndex: { max: v } }, 'firm-2'), {
        viewerFirmId: 'firm-2',
        rule: { minTests: 1, minFirms: 1, maxFirmShare: 1 },
      });
      return summariseParameter(context, 'compressionIndex').pooled;
    };
    const masked = (target.compressionIndex as number) * maskFactor(target.recordKey, PARAMETERS.compressionIndex);
    const below = count(masked - 1e-9);
    const at = count(masked);
    if (!below.released || !at.released) throw new Error('expected figures');
    expect(at.n - below.n).toBe(1);
    const truth = target.compressionIndex as number;
    const atTruth = count(truth);
    const belowTruth = count(truth - 1e-9);
    if (!atTruth.released || !belowTruth.released) throw new Error('expected figures');
    expect(atTruth.n - belowTruth.n).toBe(0);
    expect(Math.abs(masked / (target.compressionIndex as number) - 1)).toBeGreaterThanOrEqual(
      PARAMETERS.compressionIndex.maskBand.min - 1e-12,
    );
  });

  it('refuses a range with min above max', () => {
    expect(() => filterByValueRanges(columns, { liquidLimitPct: { min: 80, max: 60 } }, null)).toThrow(/min ≤ max/);
  });
});
