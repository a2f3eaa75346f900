import { describe, expect, it } from 'vitest';
import {
  analyseSelection,
  columnsFromRecords,
  estimatorRange,
  type SelectionColumns,
  STATISTICS_CAUTIONS,
  StatisticsInputError,
} from '../../../src/lib/statistics';
import { simulatedRecords } from './support/simulated-selection';

function keysDeep(value: unknown, found = new Set<string>()): Set<string> {
  if (Array.isArray(value)) for (const item of value) keysDeep(item, found);
  else if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      found.add(key);
      keysDeep(item, found);
    }
  }
  return found;
}

describe('analyseSelection', () => {
  const columns = columnsFromRecords(simulatedRecords({ seed: 8, count: 250 }));
  const analysis = analyseSelection(columns, {
    viewerFirmId: 'firm-0',
    profile: {
      stressLine: { layers: [{ thicknessM: 40, unitWeightAboveKnPerM3: 17, unitWeightBelowKnPerM3: 16 }], waterTableDepthM: 1.5 },
    },
  });

  it('returns summaries, all correlation pairs, published comparisons, a profile, methods and cautions', () => {
    expect(analysis.summaries.length).toBeGreaterThan(10);
    expect(analysis.correlations.map((c) => c.pair.id)).toEqual([
      'cc-ll',
      'cc-wn',
      'cc-e0',
      'cc-pi',
      'cr-cc',
      'calpha-cc',
      'cv-ll',
      'sigmap-depth',
      'ocr-depth',
    ]);
    expect(analysis.published).toHaveLength(20);
    expect(analysis.profile?.effectiveStressLine?.effectiveStressKpa.length).toBe(51);
    expect(analysis.methods.percentiles).toMatch(/Hyndman & Fan \(1996\) type 7/);
    expect(analysis.methods.logScale).toMatch(/orders of magnitude/);
    expect(analysis.cautions).toBe(STATISTICS_CAUTIONS);
    expect(analysis.cautions.join(' ')).toMatch(/licensed engineer/);
  });

  it('is plain JSON and never carries a minimum or maximum', () => {
    const text = JSON.stringify(analysis);
    // no typed arrays, functions, NaN or Infinity: the round trip through JSON changes nothing
    expect(JSON.parse(text)).toEqual(analysis);
    const names = [...keysDeep(JSON.parse(text))];
    expect(names.filter((k) => /^(min|max|minimum|maximum)$/i.test(k))).toEqual([]);
  });

  it('hands a released card to the estimator as P10/P50/P90, and the viewer’s own when pooled figures are withheld', () => {
    const cc = analysis.summaries.find((s) => s.parameter === 'compressionIndex');
    if (!cc?.pooled.released) throw new Error('expected pooled Cc');
    expect(estimatorRange(cc)).toEqual({
      spec: { type: 'p10p50p90', p10: cc.pooled.p10, p50: cc.pooled.p50, p90: cc.pooled.p90 },
      basis: 'pooled',
      n: 250,
      firms: 3,
    });
    const alone = analyseSelection(columnsFromRecords(simulatedRecords({ seed: 8, count: 30, firmShares: [1] })), {
      viewerFirmId: 'firm-0',
      parameters: ['compressionIndex'],
      correlations: [],
      profile: false,
    });
    const own = alone.summaries[0];
    if (!own) throw new Error('no summary');
    expect(estimatorRange(own)).toMatchObject({ basis: 'own', n: 30, firms: 1 });
  });

  it('refuses columns of different lengths, naming the column', () => {
    const broken: SelectionColumns = { ...columns, depthM: new Float64Array(3) };
    expect(() => analyseSelection(broken, { viewerFirmId: null })).toThrow(StatisticsInputError);
    expect(() => analyseSelection(broken, { viewerFirmId: null })).toThrow(/Column depthM has 3 entries; the selection has 250/);
  });
});
