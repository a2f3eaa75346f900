/**
 * Where an engineer's own site results sit in a deposit's distribution: percentile and a flag beyond
 * Tukey's far-out fences, as the stewards' review page does (pool-comparison.ts). Against the pooled
 * tests when the disclosure rule allows — their masked values, with the site value first mapped into
 * the masked spread, v' = m + (v − m)·s̃/s, so that a value at the released P90 reads as the 90th
 * percentile — and otherwise against the viewer's own tests only.
 */
import type { StatisticsContext, Withheld } from './context';
import { checkDisclosure } from './disclosure';
import { maskedValues, noiseMoments } from './masking';
import { PARAMETERS, type ParameterKey } from './parameters';
import { compareWithPool, type PoolComparison } from './pool-comparison';

export interface SiteComparison {
  parameter: ParameterKey;
  /** What the values were compared with. */
  basis: 'pooled' | 'own' | 'none';
  /** One entry per site value (null for a value that cannot be compared, e.g. cv ≤ 0). */
  results: (PoolComparison | null)[];
  /** Why the pooled tests were not used, when they were not. */
  withheld: Withheld | null;
}

function spreadRatio(pool: readonly number[], key: ParameterKey, isLog: boolean): { centre: number; ratio: number } {
  const values = isLog ? pool.map(Math.log) : pool;
  const n = values.length;
  const mean = values.reduce((s, x) => s + x, 0) / n;
  const variance = values.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1);
  const moments = noiseMoments(key);
  const noise = isLog
    ? moments.lnVariance
    : (moments.factorVariance / (1 + moments.factorVariance)) * (values.reduce((s, x) => s + x * x, 0) / n);
  const corrected = Math.max(0, variance - noise);
  return { centre: mean, ratio: corrected > 0 ? Math.sqrt(variance / corrected) : 1 };
}

export function compareSiteValues(context: StatisticsContext, key: ParameterKey, siteValues: readonly number[]): SiteComparison {
  const { columns, classWeights, viewerIndex, rule } = context;
  const raw = columns.values[key];
  const isLog = PARAMETERS[key].scale === 'log';
  const perFirm = new Uint32Array(columns.firmIds.length);
  const rows: number[] = [];
  for (let i = 0; raw && i < columns.length; i++) {
    const x = raw[i] as number;
    if (!Number.isFinite(x) || (isLog && x <= 0) || classWeights[columns.qualityClass[i] as number] === 0) continue;
    rows.push(i);
    const firm = columns.firmIndex[i] as number;
    perFirm[firm] = (perFirm[firm] as number) + 1;
  }
  const verdict = checkDisclosure(perFirm, rule);
  if (verdict.released) {
    const masked = maskedValues(columns, key) as Float64Array;
    const pool = rows.map((i) => masked[i] as number);
    const { centre, ratio } = spreadRatio(pool, key, isLog);
    const toMasked = (v: number) => {
      if (isLog) return v > 0 ? Math.exp(centre + (Math.log(v) - centre) * ratio) : v;
      return centre + (v - centre) * ratio;
    };
    return {
      parameter: key,
      basis: 'pooled',
      results: siteValues.map((v) => compareWithPool(pool, toMasked(v), isLog)),
      withheld: null,
    };
  }
  const withheld: Withheld = { released: false, tests: verdict.tests, firms: verdict.firms, reasons: verdict.reasons };
  const own = rows.filter((i) => columns.firmIndex[i] === viewerIndex).map((i) => (raw as Float64Array)[i] as number);
  if (own.length === 0) return { parameter: key, basis: 'none', results: siteValues.map(() => null), withheld };
  return { parameter: key, basis: 'own', results: siteValues.map((v) => compareWithPool(own, v, isLog)), withheld };
}
