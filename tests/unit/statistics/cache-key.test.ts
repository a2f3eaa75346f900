import { describe, expect, it } from 'vitest';
import { STATISTICS_ALGORITHM_VERSION, statisticsCacheKey } from '../../../src/lib/statistics';

const base = { bankVersionId: 7, viewerFirmId: 'firm-a', selection: { unit: ['saltreach-clay'], depthM: { min: 5, max: 15 } } };

describe('statistics cache key', () => {
  it('ignores key order, list order, duplicates, empty values and spelled-out defaults', () => {
    const a = statisticsCacheKey({
      ...base,
      selection: { depthM: { max: 15, min: 5 }, region: ['b', 'a', 'a'], unit: ['saltreach-clay'], text: '', uscs: [] },
    });
    const b = statisticsCacheKey({
      ...base,
      selection: { unit: ['saltreach-clay'], region: ['a', 'b'], depthM: { min: 5, max: 15 } },
      quality: { include: ['unknown', 4, 3, 2, 1], weighting: 'equal' },
      rule: { minTests: 5 },
    });
    expect(a).toBe(b);
    expect(a.startsWith(`statistics:v${STATISTICS_ALGORITHM_VERSION}:bank7:`)).toBe(true);
  });

  it('treats −0 as 0 and composed and decomposed accents alike', () => {
    expect(statisticsCacheKey({ ...base, selection: { depthM: { min: -0 }, unit: ['Vennmoor Flats é'] } })).toBe(
      statisticsCacheKey({ ...base, selection: { depthM: { min: 0 }, unit: ['Vennmoor Flats e\u0301'] } }),
    );
  });

  it.each([
    ['bank version', { ...base, bankVersionId: 8 }],
    ['selection', { ...base, selection: { ...base.selection, depthM: { min: 5, max: 16 } } }],
    ['quality filter', { ...base, quality: { include: [1, 2] as const } }],
    ['weighting', { ...base, quality: { weighting: 'byClass' as const } }],
    ['viewer', { ...base, viewerFirmId: 'firm-b' }],
    ['thresholds', { ...base, rule: { minFirms: 3 } }],
    ['options', { ...base, options: { pairs: ['cc-ll'] } }],
  ])('changes with the %s', (_name, changed) => {
    expect(statisticsCacheKey(changed)).not.toBe(statisticsCacheKey(base));
  });

  it('refuses a non-finite number or a bad bank version', () => {
    expect(() => statisticsCacheKey({ ...base, selection: { depthM: { min: Number.NaN } } })).toThrow(/finite/);
    expect(() => statisticsCacheKey({ ...base, bankVersionId: -1 })).toThrow(/bankVersionId/);
  });
});
