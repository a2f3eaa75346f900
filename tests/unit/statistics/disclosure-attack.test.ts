import { describe, expect, it } from 'vitest';
import {
  columnsFromRecords,
  correlatePair,
  type DistributionFigures,
  PARAMETERS,
  type ParameterKey,
  type StatisticsRecord,
  statisticsContext,
  summariseParameter,
} from '../../../src/lib/statistics';
import { maskFactor, noiseMoments } from '../../../src/lib/statistics/masking';
import { normalFrom, seededRandom, simulatedRecords } from './support/simulated-selection';

// The attacker is firm "attacker"; the target is one test of firm "victim". Two selections differ by
// that test alone; the attacker reads both results as the API would give them.

type Released = { released: true } & DistributionFigures;

function pooledOf(records: StatisticsRecord[], key: ParameterKey): Released {
  const summary = summariseParameter(statisticsContext(columnsFromRecords(records, [key]), { viewerFirmId: 'attacker' }), key);
  if (!summary.pooled.released) throw new Error('expected the rule to release');
  return summary.pooled;
}

/** Undoes the published masking correction of a linear summary: the masked mean and sum of squares. */
function maskedMoments(figures: Released, key: ParameterKey) {
  const v = noiseMoments(key).factorVariance;
  const k = v / (1 + v);
  const n = figures.n;
  const m = figures.mean;
  const sd = figures.sd as number;
  // s² = s̃² − k·mean(x̃²), mean(x̃²) = ((n − 1)s̃² + n·m²)/n  ⇒  s̃² = (s² + k·m²)/(1 − k(n − 1)/n)
  const maskedVariance = (sd * sd + k * m * m) / (1 - (k * (n - 1)) / n);
  return { sum: n * m, squares: (n - 1) * maskedVariance + n * m * m, maskedVariance, mean: m };
}

function randomCase(seed: number, key: 'compressionIndex' | 'liquidLimitPct' | 'preconsolidationStressKpa') {
  const random = seededRandom(seed);
  const normal = normalFrom(random);
  const centre = { compressionIndex: 0.6, liquidLimitPct: 65, preconsolidationStressKpa: 80 }[key];
  const cov = { compressionIndex: 0.3, liquidLimitPct: 0.15, preconsolidationStressKpa: 0.3 }[key];
  const firms = ['attacker', 'victim', 'third'];
  const count = 5 + Math.floor(random() * 60);
  const base: StatisticsRecord[] = Array.from({ length: count }, (_, i) => ({
    firmId: firms[i % 3] as string,
    recordKey: Math.floor(random() * 2 ** 32),
    depthM: 2 + 20 * random(),
    [key]: centre * Math.max(0.2, 1 + cov * normal()),
  }));
  const target: StatisticsRecord = {
    firmId: 'victim',
    recordKey: Math.floor(random() * 2 ** 32),
    depthM: 7,
    [key]: centre * Math.max(0.2, 1 + cov * normal()),
  };
  return {
    base,
    target,
    truth: target[key] as number,
    masked: (target[key] as number) * maskFactor(target.recordKey, PARAMETERS[key]),
  };
}

describe('the differencing attack fails', () => {
  const cases = 300;

  it.each(['compressionIndex', 'liquidLimitPct', 'preconsolidationStressKpa'] as const)(
    '%s: n·mean and sum-of-squares differences recover only the masked value, never closer than the band minimum',
    (key) => {
      const { min } = PARAMETERS[key].maskBand;
      let closest = Number.POSITIVE_INFINITY;
      let above = 0;
      let squaresRouteWorked = 0;
      for (let seed = 1; seed <= cases; seed++) {
        const { base, target, truth, masked } = randomCase(seed, key);
        const beforeFigures = pooledOf(base, key);
        const afterFigures = pooledOf([...base, target], key);
        const before = maskedMoments(beforeFigures, key);
        const after = maskedMoments(afterFigures, key);
        const fromMeans = after.sum - before.sum;
        // the attacks work: they give back the masked value (the sd route only where the corrected sd
        // was not cut to 0, which hides even the masked value) ...
        expect(fromMeans).toBeCloseTo(masked, 6);
        if (beforeFigures.sd !== 0 && afterFigures.sd !== 0) {
          expect(Math.abs(Math.sqrt(after.squares - before.squares) - masked) / masked).toBeLessThan(1e-6);
          squaresRouteWorked++;
        }
        // ... which is never within the band minimum of the truth
        const error = Math.abs(fromMeans - truth) / truth;
        expect(error).toBeGreaterThanOrEqual(min * (1 - 1e-6));
        closest = Math.min(closest, error);
        if (fromMeans > truth) above++;
      }
      expect(closest).toBeGreaterThanOrEqual(min * (1 - 1e-6));
      expect(squaresRouteWorked).toBeGreaterThan(cases * 0.9);
      // the attacker cannot tell whether the masked value lies above or below the truth: about half and half
      // (binomial sd for 300 cases is 2.9 %; ±10 % is a 3.5-sd allowance)
      expect(Math.abs(above / cases - 0.5)).toBeLessThan(0.1);
    },
  );

  it('a median that lands on the target is its masked value, not its true value', () => {
    const key = 'compressionIndex';
    const { min } = PARAMETERS[key].maskBand;
    for (let seed = 1; seed <= 100; seed++) {
      const random = seededRandom(seed);
      // 10 tests well below and 10 well above; the target in the middle becomes the median of 21
      const base: StatisticsRecord[] = Array.from({ length: 20 }, (_, i) => ({
        firmId: i % 2 ? 'third' : 'attacker',
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        compressionIndex: i < 10 ? 0.2 + 0.01 * i : 1.2 + 0.01 * i,
      }));
      const target = {
        firmId: 'victim',
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        compressionIndex: 0.5 + 0.2 * random(),
      };
      const masked = target.compressionIndex * maskFactor(target.recordKey, PARAMETERS[key]);
      const after = pooledOf([...base, target], key);
      const moments = maskedMoments(after, key);
      // undo the published pull towards the mean: P̃ = m + (P − m)·s̃/s
      const unshrunk = moments.mean + ((after.p50 - moments.mean) * Math.sqrt(moments.maskedVariance)) / (after.sd as number);
      expect(unshrunk).toBeCloseTo(masked, 9);
      expect(Math.abs(unshrunk - target.compressionIndex) / target.compressionIndex).toBeGreaterThanOrEqual(min * (1 - 1e-6));
    }
  });

  it('cv: the log-space figures give back only the masked value, a factor of at least exp(a) off', () => {
    const key = 'cvNcM2PerYear';
    const { min } = PARAMETERS[key].maskBand;
    for (let seed = 1; seed <= cases; seed++) {
      const random = seededRandom(seed);
      const normal = normalFrom(random);
      const make = (firmId: string) => ({
        firmId,
        recordKey: Math.floor(random() * 2 ** 32),
        depthM: 5,
        cvNcM2PerYear: Math.exp(0.8 * normal()),
      });
      const base = Array.from({ length: 8 + Math.floor(random() * 40) }, (_, i) => make(i % 2 ? 'attacker' : 'third'));
      const target = make('victim');
      const lnSum = (figures: Released) => figures.n * Math.log(figures.logNormal?.geometricMean as number);
      const recovered = Math.exp(lnSum(pooledOf([...base, target], key)) - lnSum(pooledOf(base, key)));
      const masked = target.cvNcM2PerYear * maskFactor(target.recordKey, PARAMETERS[key]);
      expect(Math.abs(Math.log(recovered / masked))).toBeLessThan(1e-9);
      expect(Math.abs(Math.log(recovered / target.cvNcM2PerYear))).toBeGreaterThanOrEqual(min * (1 - 1e-6));
    }
  });

  it('scatter points of other firms are masked; the viewer’s own are not', () => {
    const records = simulatedRecords({ seed: 5, count: 60 });
    const columns = columnsFromRecords(records);
    const result = correlatePair(statisticsContext(columns, { viewerFirmId: 'firm-0' }), 'cc-ll');
    if (!result.pooled.released || !result.pooled.points || !result.own?.points) throw new Error('expected points');
    const others = records.filter((r) => r.firmId !== 'firm-0');
    const own = records.filter((r) => r.firmId === 'firm-0');
    expect(result.pooled.points.y).toEqual(
      others.map((r) => (r.compressionIndex as number) * maskFactor(r.recordKey, PARAMETERS.compressionIndex)),
    );
    expect(result.own.points.y.map((y) => Number(y.toFixed(12)))).toEqual(
      own.map((r) => Number((r.compressionIndex as number).toFixed(12))),
    );
  });
});

describe('released figures stay close to the true ones', () => {
  // "True" figures: the same records as one firm's own data (unmasked). Tolerances in units of the
  // true sd (log sd for cv), the largest error over every seeded selection, measured and then set just
  // above: the masking costs about as much as a quarter fewer tests would.
  const keys = [
    'compressionIndex',
    'liquidLimitPct',
    'waterContentPct',
    'initialVoidRatio',
    'cvNcM2PerYear',
    'preconsolidationStressKpa',
  ] as const;

  function worstErrors(count: number, seeds: number) {
    const worst = { mean: 0, percentile: 0, sd: 0 };
    for (let seed = 1; seed <= seeds; seed++) {
      const records = simulatedRecords({ seed, count });
      const pooledContext = statisticsContext(columnsFromRecords(records), { viewerFirmId: null });
      const trueContext = statisticsContext(columnsFromRecords(records.map((r) => ({ ...r, firmId: 'all' }))), {
        viewerFirmId: 'all',
      });
      for (const key of keys) {
        const pooled = summariseParameter(pooledContext, key).pooled;
        const truth = summariseParameter(trueContext, key).own;
        if (!pooled.released || !truth) throw new Error('expected figures');
        const isLog = PARAMETERS[key].scale === 'log';
        const sd = (isLog ? truth.logNormal?.lnSd : truth.sd) as number;
        const error = (a: number, b: number) => Math.abs(isLog ? Math.log(a / b) : a - b) / sd;
        worst.mean = Math.max(worst.mean, error(pooled.mean, truth.mean));
        for (const p of ['p10', 'p50', 'p90'] as const) worst.percentile = Math.max(worst.percentile, error(pooled[p], truth[p]));
        worst.sd = Math.max(worst.sd, Math.abs(((isLog ? pooled.logNormal?.lnSd : pooled.sd) as number) / sd - 1));
      }
    }
    return worst;
  }

  it('100 tests, 200 selections: mean within 0.2 sd, P10/P50/P90 within 0.6 sd, sd within 20 %', () => {
    const worst = worstErrors(100, 200);
    expect(worst.mean).toBeLessThan(0.2);
    expect(worst.percentile).toBeLessThan(0.6);
    expect(worst.sd).toBeLessThan(0.2);
  });

  it('1000 tests, 20 selections: mean within 0.06 sd, P10/P50/P90 within 0.2 sd, sd within 5 %', () => {
    const worst = worstErrors(1000, 20);
    expect(worst.mean).toBeLessThan(0.06);
    expect(worst.percentile).toBeLessThan(0.2);
    expect(worst.sd).toBeLessThan(0.05);
  });

  it('regression slopes through masked values stay within 3.5 of their own standard errors of the true-data slope', () => {
    let worst = 0;
    for (let seed = 1; seed <= 100; seed++) {
      const records = simulatedRecords({ seed, count: 100 });
      const pooledContext = statisticsContext(columnsFromRecords(records), { viewerFirmId: null });
      const trueContext = statisticsContext(columnsFromRecords(records.map((r) => ({ ...r, firmId: 'all' }))), {
        viewerFirmId: 'all',
      });
      for (const id of ['cc-ll', 'cc-wn', 'cc-e0', 'cv-ll', 'sigmap-depth'] as const) {
        const pooled = correlatePair(pooledContext, id, { includePoints: false }).pooled;
        const truth = correlatePair(trueContext, id, { includePoints: false }).own?.line?.fit;
        if (!pooled.released || !pooled.line || !truth) throw new Error('expected fits');
        worst = Math.max(worst, Math.abs(pooled.line.fit.slope - truth.slope) / pooled.line.fit.slopeStandardError);
      }
    }
    expect(worst).toBeLessThan(3.5);
  });
});
