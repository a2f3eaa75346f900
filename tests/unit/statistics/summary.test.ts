import lognormalQuantile from '@stdlib/stats-base-dists-lognormal-quantile';
import { quantileSorted } from 'd3-array';
import { mean, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { columnsFromRecords, type StatisticsRecord, statisticsContext, summariseParameter } from '../../../src/lib/statistics';
import { normalFrom, seededRandom, simulatedRecords } from './support/simulated-selection';

function ownOnly(values: number[], key: 'compressionIndex' | 'cvNcM2PerYear', classes?: number[]): StatisticsRecord[] {
  return values.map((v, i) => ({
    firmId: 'mine',
    recordKey: i * 7919,
    depthM: 5,
    sampleQualityClass: classes?.[i] ?? 1,
    [key]: v,
  }));
}

describe('own figures (unmasked) against independent libraries', () => {
  const random = seededRandom(7);
  const normal = normalFrom(random);
  const cc = Array.from({ length: 57 }, () => 0.6 + 0.15 * normal());
  const context = statisticsContext(columnsFromRecords(ownOnly(cc, 'compressionIndex')), { viewerFirmId: 'mine' });
  const summary = summariseParameter(context, 'compressionIndex');

  it('n, mean, sd, CV and type-7 percentiles', () => {
    // source: simple-statistics 7.12.1 mean / sampleStandardDeviation; d3-array 3.2.5 quantileSorted (type 7)
    const own = summary.own;
    const sorted = [...cc].sort((a, b) => a - b);
    expect(own?.n).toBe(57);
    expect(own?.mean).toBeCloseTo(mean(cc), 12);
    expect(own?.sd).toBeCloseTo(sampleStandardDeviation(cc), 12);
    expect(own?.coefficientOfVariation).toBeCloseTo(sampleStandardDeviation(cc) / mean(cc), 12);
    for (const [p, got] of [
      [0.05, own?.p5],
      [0.1, own?.p10],
      [0.5, own?.p50],
      [0.9, own?.p90],
      [0.95, own?.p95],
    ] as const) {
      expect(got).toBeCloseTo(quantileSorted(sorted, p) as number, 12);
    }
  });

  it('one firm alone: pooled figures withheld, and it says why', () => {
    expect(summary.pooled).toEqual({
      released: false,
      tests: 57,
      firms: 1,
      reasons: [
        {
          code: 'TOO_FEW_FIRMS',
          message: 'All 57 tests come from one firm; figures pooled across firms need tests from at least 2 firms.',
        },
      ],
    });
  });
});

describe('log-normal treatment of cv', () => {
  const random = seededRandom(11);
  const normal = normalFrom(random);
  const cv = Array.from({ length: 41 }, () => Math.exp(Math.log(1.2) + 0.9 * normal()));
  const logs = cv.map(Math.log);
  const mu = mean(logs);
  const sigma = sampleStandardDeviation(logs);
  const own = summariseParameter(
    statisticsContext(columnsFromRecords(ownOnly(cv, 'cvNcM2PerYear')), { viewerFirmId: 'mine' }),
    'cvNcM2PerYear',
  ).own;

  it('geometric mean, log sd and the fitted log-normal percentiles', () => {
    // source: @stdlib/stats-base-dists-lognormal-quantile 0.2.3 (independent of the core)
    expect(own?.logNormal?.geometricMean).toBeCloseTo(Math.exp(mu), 12);
    expect(own?.logNormal?.lnSd).toBeCloseTo(sigma, 12);
    expect(own?.logNormal?.log10Sd).toBeCloseTo(sigma / Math.LN10, 12);
    expect(own?.logNormal?.fittedP10).toBeCloseTo(lognormalQuantile(0.1, mu, sigma), 10);
    expect(own?.logNormal?.fittedP50).toBeCloseTo(lognormalQuantile(0.5, mu, sigma), 10);
    expect(own?.logNormal?.fittedP90).toBeCloseTo(lognormalQuantile(0.9, mu, sigma), 10);
  });

  it('percentiles taken on logarithms (geometric interpolation), mean and CV of the fitted log-normal', () => {
    // source: d3-array quantileSorted on ln values; log-normal moments E = exp(μ + σ²/2), CV = √(exp(σ²) − 1)
    const sortedLogs = [...logs].sort((a, b) => a - b);
    expect(own?.p10).toBeCloseTo(Math.exp(quantileSorted(sortedLogs, 0.1) as number), 12);
    expect(own?.p90).toBeCloseTo(Math.exp(quantileSorted(sortedLogs, 0.9) as number), 12);
    expect(own?.mean).toBeCloseTo(Math.exp(mu + (sigma * sigma) / 2), 12);
    expect(own?.coefficientOfVariation).toBeCloseTo(Math.sqrt(Math.exp(sigma * sigma) - 1), 12);
  });

  it('leaves out zero and negative cv, which a logarithm cannot take', () => {
    const records = ownOnly([1, 2, 0, -1], 'cvNcM2PerYear');
    const summary = summariseParameter(statisticsContext(columnsFromRecords(records), { viewerFirmId: 'mine' }), 'cvNcM2PerYear');
    expect(summary.own?.n).toBe(2);
  });
});

describe('the disclosure rule on a summary', () => {
  const make = (perFirm: number[]) =>
    columnsFromRecords(
      perFirm.flatMap((count, f) =>
        Array.from({ length: count }, (_, i) => ({
          firmId: `f${f}`,
          recordKey: f * 1000 + i,
          depthM: 3,
          compressionIndex: 0.5 + 0.01 * i,
        })),
      ),
    );
  const pooled = (perFirm: number[]) =>
    summariseParameter(statisticsContext(make(perFirm), { viewerFirmId: 'f0' }), 'compressionIndex').pooled;

  it.each([
    [[2, 2], 'TOO_FEW_TESTS', 'Only 4 tests stand behind this figure; figures pooled across firms need at least 5 tests.'],
    [[5], 'TOO_FEW_FIRMS', 'All 5 tests come from one firm; figures pooled across firms need tests from at least 2 firms.'],
    [
      [4, 1],
      'ONE_FIRM_DOMINATES',
      'One firm contributed 4 of the 5 tests (80 %); no firm may contribute more than 75 % of the tests behind a pooled figure.',
    ],
  ])('%j tests per firm: %s', (perFirm, code, message) => {
    expect(pooled(perFirm)).toMatchObject({ released: false, reasons: [{ code, message }] });
  });

  it('releases at exactly 75 % from one firm, 5 tests, 2 firms — without a minimum or maximum', () => {
    const result = pooled([6, 2]);
    expect(result.released).toBe(true);
    expect(Object.keys(result).some((k) => /min|max/i.test(k))).toBe(false);
  });

  it('takes thresholds from the platform admin', () => {
    const context = statisticsContext(make([3, 3]), { viewerFirmId: 'f0', rule: { minTests: 10 } });
    expect(summariseParameter(context, 'compressionIndex').pooled.released).toBe(false);
    expect(() => statisticsContext(make([3]), { viewerFirmId: null, rule: { maxFirmShare: 0 } })).toThrow(/largest share/);
  });

  it('a viewer with no tests gets no own figures', () => {
    const summary = summariseParameter(statisticsContext(make([3, 3]), { viewerFirmId: 'elsewhere' }), 'compressionIndex');
    expect(summary.own).toBeNull();
    expect(summary.pooled.released).toBe(true);
  });
});

describe('sample quality filter and weights', () => {
  const values = [0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
  const classes = [1, 1, 2, 3, 4, 0];
  const columns = columnsFromRecords(ownOnly(values, 'compressionIndex', classes));

  it('keeps only the classes asked for', () => {
    const own = summariseParameter(
      statisticsContext(columns, { viewerFirmId: 'mine', quality: { include: [1, 2] } }),
      'compressionIndex',
    ).own;
    expect(own?.n).toBe(3);
    expect(own?.mean).toBeCloseTo(0.5, 12);
  });

  it('weights by class: weighted mean, reliability-weighted sd and Kish effective n', () => {
    // weights 1, 1, 0.75, 0.5, 0.25, 0.5 (unknown); V1 = 4, V2 = 3.125
    const w = [1, 1, 0.75, 0.5, 0.25, 0.5];
    const v1 = w.reduce((a, b) => a + b, 0);
    const v2 = w.reduce((a, b) => a + b * b, 0);
    const m = values.reduce((s, x, i) => s + (w[i] as number) * x, 0) / v1;
    const s2 = values.reduce((s, x, i) => s + (w[i] as number) * (x - m) ** 2, 0) / (v1 - v2 / v1);
    const own = summariseParameter(
      statisticsContext(columns, { viewerFirmId: 'mine', quality: { weighting: 'byClass' } }),
      'compressionIndex',
    ).own;
    expect(own?.mean).toBeCloseTo(m, 12);
    expect(own?.sd).toBeCloseTo(Math.sqrt(s2), 12);
    expect(own?.nEffective).toBeCloseTo((v1 * v1) / v2, 12);
    expect(own?.n).toBe(6);
  });

  it('refuses an unknown class or a weight that is not positive', () => {
    expect(() => statisticsContext(columns, { viewerFirmId: null, quality: { include: [5 as 1] } })).toThrow(
      /Unknown sample quality class/,
    );
    expect(() =>
      statisticsContext(columns, { viewerFirmId: null, quality: { weighting: 'byClass', weights: { 2: 0 } } }),
    ).toThrow(/positive/);
  });
});

describe('a realistic pooled selection', () => {
  it('released figures carry n and firms and stay ordered P5 ≤ P10 ≤ P50 ≤ P90 ≤ P95', () => {
    const context = statisticsContext(columnsFromRecords(simulatedRecords({ seed: 3, count: 400 })), { viewerFirmId: 'firm-2' });
    for (const key of ['compressionIndex', 'liquidLimitPct', 'cvNcM2PerYear', 'preconsolidationStressKpa'] as const) {
      const { pooled, own } = summariseParameter(context, key);
      if (!pooled.released) throw new Error('expected release');
      expect(pooled.n).toBe(400);
      expect(pooled.firms).toBe(3);
      expect(pooled.p5).toBeLessThanOrEqual(pooled.p10);
      expect(pooled.p10).toBeLessThanOrEqual(pooled.p50);
      expect(pooled.p50).toBeLessThanOrEqual(pooled.p90);
      expect(pooled.p90).toBeLessThanOrEqual(pooled.p95);
      expect(own?.firms).toBe(1);
    }
  });
});
