import { z } from 'zod';
import { type NumericRange, rangeSchema } from './bank-selection';

/**
 * From a Deposit page (or any statistics view) to a new estimate: the geological unit, the depth range
 * the figures came from, and per parameter the bank's P10 / P50 / P90, all in the bank's SI units. The
 * statistics pages write it as the query string of `/estimates/new`; the estimate page reads it back
 * with `parseEstimatePrefill` and offers the three values as a `p10p50p90` parameter of a layer.
 *
 *   /estimates/new?unit=saltreach-estuarine-clay&depth=5..15&bankVersion=12&cc=0.55,0.82,1.2&cvNc=0.4,1,2.6
 *
 * Each parameter is `p10,p50,p90` (ascending). `basis` says whether the figures are pooled across firms
 * or the viewer's own firm's tests alone (when the disclosure rule withheld the pooled ones).
 */
export const ESTIMATE_PREFILL_PATH = '/estimates/new';

/** The parameters a prefill may carry: the key in the URL, the statistics' parameter, and its SI unit. */
export const ESTIMATE_PREFILL_PARAMETERS = [
  { key: 'cc', parameter: 'compressionIndex', symbol: 'Cc', unit: '' },
  { key: 'cr', parameter: 'recompressionIndex', symbol: 'Cr', unit: '' },
  { key: 'e0', parameter: 'initialVoidRatio', symbol: 'e0', unit: '' },
  { key: 'sigmaP', parameter: 'preconsolidationStressKpa', symbol: "σ'p", unit: 'kPa' },
  { key: 'ocr', parameter: 'overconsolidationRatio', symbol: 'OCR', unit: '' },
  { key: 'cvNc', parameter: 'cvNcM2PerYear', symbol: 'cv NC', unit: 'm²/yr' },
  { key: 'cvOc', parameter: 'cvOcM2PerYear', symbol: 'cv OC', unit: 'm²/yr' },
  { key: 'cAlpha', parameter: 'secondaryCompressionIndex', symbol: 'Cα', unit: '' },
  { key: 'gamma', parameter: 'bulkUnitWeightKnPerM3', symbol: 'γ', unit: 'kN/m³' },
] as const;

export type EstimatePrefillKey = (typeof ESTIMATE_PREFILL_PARAMETERS)[number]['key'];
export const ESTIMATE_PREFILL_KEYS = ESTIMATE_PREFILL_PARAMETERS.map((p) => p.key) as readonly EstimatePrefillKey[];

export interface PrefillRange {
  p10: number;
  p50: number;
  p90: number;
}

const NUMBER = /^-?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?$/i;

/** "0.55,0.82,1.2" → { p10, p50, p90 }: three numbers above 0, in ascending order. */
export const prefillRangeSchema = z.string().transform((text, ctx): PrefillRange => {
  const parts = text.split(',').map((part) => part.trim());
  if (parts.length !== 3 || !parts.every((part) => NUMBER.test(part))) {
    ctx.addIssue({ code: 'custom', message: 'Write P10, P50 and P90 as three numbers separated by commas, e.g. 0.5,0.8,1.2.' });
    return z.NEVER;
  }
  const [p10, p50, p90] = parts.map(Number) as [number, number, number];
  if (![p10, p50, p90].every((v) => Number.isFinite(v) && v > 0)) {
    ctx.addIssue({ code: 'custom', message: 'P10, P50 and P90 must each be a number above 0.' });
    return z.NEVER;
  }
  if (!(p10 <= p50 && p50 <= p90)) {
    ctx.addIssue({ code: 'custom', message: `P10 (${p10}) ≤ P50 (${p50}) ≤ P90 (${p90}) must hold; reorder the three values.` });
    return z.NEVER;
  }
  return { p10, p50, p90 };
});

const ranges = Object.fromEntries(ESTIMATE_PREFILL_KEYS.map((key) => [key, prefillRangeSchema.optional()])) as Record<
  EstimatePrefillKey,
  z.ZodOptional<typeof prefillRangeSchema>
>;

export const estimatePrefillSchema = z.strictObject({
  unit: z
    .string()
    .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use the geological unit’s lower-case name with hyphens, as in the bank’s links.')
    .max(100, 'A name in a link is at most 100 characters.'),
  /** Depth below ground the figures came from, m. */
  depth: rangeSchema.optional(),
  bankVersion: z.coerce.number().int('A bank version is a whole number.').positive('A bank version is 1 or more.').optional(),
  basis: z.enum(['pooled', 'own'], { error: 'basis is pooled or own.' }).optional(),
  ...ranges,
});

export type EstimatePrefill = z.output<typeof estimatePrefillSchema>;

/** Reads a prefill from a query string; unknown keys are refused (strict). */
export function parseEstimatePrefill(params: URLSearchParams) {
  return estimatePrefillSchema.safeParse(Object.fromEntries(params));
}

const formatRange = (range: NumericRange) => `${range.min ?? ''}..${range.max ?? ''}`;
/** Enough digits for an engine input, few enough for a readable link. */
const short = (value: number) => String(Number(value.toPrecision(4)));

/** The query string of a prefill, keys in a fixed order (parameters after unit, depth and version). */
export function estimatePrefillToSearchParams(prefill: EstimatePrefill): URLSearchParams {
  const params = new URLSearchParams();
  params.set('unit', prefill.unit);
  if (prefill.depth && (prefill.depth.min !== undefined || prefill.depth.max !== undefined)) {
    params.set('depth', formatRange(prefill.depth));
  }
  if (prefill.bankVersion !== undefined) params.set('bankVersion', String(prefill.bankVersion));
  if (prefill.basis) params.set('basis', prefill.basis);
  for (const key of ESTIMATE_PREFILL_KEYS) {
    const range = prefill[key];
    if (range) params.set(key, [range.p10, range.p50, range.p90].map(short).join(','));
  }
  return params;
}

/** The link that opens a new estimate with these ranges filled in. */
export function estimatePrefillHref(prefill: EstimatePrefill): string {
  return `${ESTIMATE_PREFILL_PATH}?${estimatePrefillToSearchParams(prefill).toString()}`;
}
