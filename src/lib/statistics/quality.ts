/**
 * Filtering and weighting by sample quality class (Lunne, Berre & Strandvik 1997 classes 1–4, from
 * Δe/e0 at the in-situ stress; see src/lib/import/sample-quality.ts). Rows store the class as 1–4, or
 * 0 when it is not known.
 */
import { SAMPLE_QUALITY_LABELS, type SampleQualityClass } from '../import/sample-quality';
import { StatisticsInputError } from './errors';

export type QualityChoice = SampleQualityClass | 'unknown';
export const QUALITY_CHOICES: readonly QualityChoice[] = [1, 2, 3, 4, 'unknown'];

/**
 * Weights by class when weighting is asked for. Ours, not from a published source: a class-1 test
 * counts fully, each poorer class a quarter less, and a test of unknown quality as much as a poor one.
 */
export const DEFAULT_QUALITY_WEIGHTS: Readonly<Record<QualityChoice, number>> = {
  1: 1,
  2: 0.75,
  3: 0.5,
  4: 0.25,
  unknown: 0.5,
};

export interface QualityOptions {
  /** Classes kept (all by default). */
  include?: readonly QualityChoice[];
  /** 'equal' (default): every kept test counts once; 'byClass': weighted by `weights`. */
  weighting?: 'equal' | 'byClass';
  weights?: Partial<Record<QualityChoice, number>>;
}

function rowCode(choice: QualityChoice): number {
  return choice === 'unknown' ? 0 : choice;
}

/**
 * Weight per row code 0–4 (0 = unknown class); 0 drops the class. Weights must be positive and
 * finite for kept classes.
 */
export function qualityWeightTable(options: QualityOptions = {}): Float64Array {
  const include = options.include ?? QUALITY_CHOICES;
  const weighting = options.weighting ?? 'equal';
  const table = new Float64Array(5);
  for (const choice of include) {
    if (!QUALITY_CHOICES.includes(choice)) {
      throw new StatisticsInputError(`Unknown sample quality class ${String(choice)}: use 1, 2, 3, 4 or 'unknown'.`);
    }
    const weight = weighting === 'equal' ? 1 : (options.weights?.[choice] ?? DEFAULT_QUALITY_WEIGHTS[choice]);
    if (!(weight > 0) || !Number.isFinite(weight)) {
      throw new StatisticsInputError(`The weight of sample quality class ${String(choice)} must be a positive number.`);
    }
    table[rowCode(choice)] = weight;
  }
  return table;
}

/** True when the table weights kept classes differently. */
export function isWeighted(table: Float64Array): boolean {
  let first = 0;
  for (const w of table) {
    if (w === 0) continue;
    if (first === 0) first = w;
    else if (w !== first) return true;
  }
  return false;
}

/** A sentence stating the filter and weights, for the methods note beside the figures. */
export function describeQuality(options: QualityOptions = {}): string {
  const include = options.include ?? QUALITY_CHOICES;
  const names = include.map((c) => (c === 'unknown' ? 'unknown quality' : `class ${c} (${SAMPLE_QUALITY_LABELS[c]})`));
  const kept = include.length === QUALITY_CHOICES.length ? 'Tests of every sample quality class' : `Tests of ${names.join(', ')}`;
  if ((options.weighting ?? 'equal') === 'equal') return `${kept}, each counted once.`;
  const table = qualityWeightTable(options);
  const weights = include.map((c) => `${c === 'unknown' ? 'unknown' : `class ${c}`} ${table[rowCode(c)]}`).join(', ');
  return `${kept}, weighted by sample quality (${weights}).`;
}
