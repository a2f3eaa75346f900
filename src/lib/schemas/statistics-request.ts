import { z } from 'zod';
import { CORRELATION_PAIR_IDS } from '../statistics/correlation-pairs';
import { PARAMETER_KEYS, type ParameterKey } from '../statistics/parameters';
import { type BankSelection, bankSelectionSchema, splitSelectionParams } from './bank-selection';

/**
 * The query strings and body of the statistics API: the bank selection (bank-selection.ts) plus a few
 * options of each view. Every object is strict, so a misspelt option is named in the error.
 */
export const QUALITY_WEIGHTINGS = ['equal', 'byClass'] as const;
export type QualityWeighting = (typeof QUALITY_WEIGHTINGS)[number];

const weighting = z
  .enum(QUALITY_WEIGHTINGS, { error: 'weighting is equal (every test counts once) or byClass (by sample quality class).' })
  .optional();

export const overviewOptionsSchema = z.strictObject({ weighting });

export const correlationOptionsSchema = z.strictObject({
  weighting,
  pair: z.enum(CORRELATION_PAIR_IDS, { error: `pair is one of: ${CORRELATION_PAIR_IDS.join(', ')}.` }),
});

export const profileOptionsSchema = z.strictObject({
  weighting,
  /** Depth of the water table below ground for the σ'v0 line, m (default 1). */
  waterTableM: z.coerce
    .number({ error: 'waterTableM is a depth in metres.' })
    .min(0, 'The water table depth is 0 m or more.')
    .max(100, 'The water table depth is at most 100 m.')
    .optional(),
});

export const compareOptionsSchema = overviewOptionsSchema;

const MAX_SITE_VALUES = 20;
const siteValue = z.number({ error: 'Each site value is a number in the bank’s SI unit.' });
const valuesShape = Object.fromEntries(
  PARAMETER_KEYS.map((key) => [
    key,
    z
      .array(siteValue)
      .min(1, 'Give at least one value.')
      .max(MAX_SITE_VALUES, `At most ${MAX_SITE_VALUES} values per parameter.`)
      .optional(),
  ]),
) as Record<ParameterKey, z.ZodOptional<z.ZodArray<typeof siteValue>>>;

/** `POST /api/statistics/compare`: one or a few site results per parameter, SI units. */
export const compareBodySchema = z.strictObject({
  values: z
    .strictObject(valuesShape)
    .refine((values) => Object.values(values).some((list) => list?.length), 'Give at least one site value to compare.'),
});
export type CompareBody = z.infer<typeof compareBodySchema>;

type Issue = { path: string; message: string };
export type ParsedStatisticsQuery<T> =
  | { success: true; selection: BankSelection; options: T }
  | { success: false; issues: Issue[] };

/** Splits a query string into the selection and the view's options and validates both. */
export function parseStatisticsQuery<S extends z.ZodType>(
  params: URLSearchParams,
  options: S,
): ParsedStatisticsQuery<z.output<S>> {
  const { selection, rest } = splitSelectionParams(params);
  const parsedSelection = bankSelectionSchema.safeParse(selection);
  const parsedOptions = options.safeParse(Object.fromEntries(rest));
  const issues: Issue[] = [];
  const collect = (error: z.ZodError) => {
    for (const issue of error.issues) issues.push({ path: issue.path.map(String).join('.'), message: issue.message });
  };
  if (!parsedSelection.success) collect(parsedSelection.error);
  if (!parsedOptions.success) collect(parsedOptions.error);
  if (!parsedSelection.success || !parsedOptions.success) return { success: false, issues };
  return { success: true, selection: parsedSelection.data, options: parsedOptions.data };
}
