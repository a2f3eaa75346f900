import { z } from 'zod';
import { TEST_METHODS } from '../import/test-method';
import { USCS_SYMBOLS } from '../import/uscs';
import { BANK_PARAMETER_KEYS, type BankParameterKey } from './bank-parameters';
import { GENESIS_VALUES } from './vocabulary';

/**
 * A selection of the bank: the facets chosen, the numeric ranges (SI units, so a shared link means the
 * same records whoever opens it) and free text. The bank browser keeps it in its URL; the search,
 * statistics and export endpoints read it from their query strings. In a URL a facet repeats its key
 * (`unit=saltreach-estuarine-clay&unit=vennmoor-peat`) and a range is `min..max` with either side
 * optional (`depth=5..15`, `cc=..0.8`).
 */
export const ORIGINS = ['own', 'pooled'] as const;
export type Origin = (typeof ORIGINS)[number];

export const FACET_KEYS = ['region', 'unit', 'genesis', 'uscs', 'method', 'quality', 'origin', 'version'] as const;
export type FacetKey = (typeof FACET_KEYS)[number];

export interface NumericRange {
  min?: number;
  max?: number;
}

const MAX_VALUES = 50;
const slug = z
  .string()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use the lower-case name with hyphens, as in the bank’s links.')
  .max(100, 'A name in a link is at most 100 characters.');
const list = <T extends z.ZodType>(item: T) =>
  z.array(item).max(MAX_VALUES, `Choose at most ${MAX_VALUES} values of one facet.`).optional();

const NUMBER = /^-?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?$/i;

/** "5..15", "..0.8", "0.3.." → { min, max }; the bounds are inclusive. */
export const rangeSchema = z.string().transform((text, ctx): NumericRange => {
  const parts = text.split('..');
  const [low = '', high = ''] = parts.map((part) => part.trim());
  if (parts.length !== 2 || (low === '' && high === '') || ![low, high].every((part) => part === '' || NUMBER.test(part))) {
    ctx.addIssue({ code: 'custom', message: 'Write a range as min..max (either side may be left out), e.g. 5..15.' });
    return z.NEVER;
  }
  const range: NumericRange = {};
  if (low !== '') range.min = Number(low);
  if (high !== '') range.max = Number(high);
  if (range.min !== undefined && range.max !== undefined && range.min > range.max) {
    ctx.addIssue({ code: 'custom', message: `The lower end (${range.min}) is above the upper end (${range.max}).` });
    return z.NEVER;
  }
  return range;
});

const rangeShape = Object.fromEntries(BANK_PARAMETER_KEYS.map((key) => [key, rangeSchema.optional()])) as Record<
  BankParameterKey,
  z.ZodOptional<typeof rangeSchema>
>;

export const bankSelectionSchema = z.strictObject({
  q: z.string().trim().max(200, 'Search text is at most 200 characters.').optional(),
  region: list(slug),
  unit: list(slug),
  genesis: list(z.enum(GENESIS_VALUES, { error: `Genesis is one of: ${GENESIS_VALUES.join(', ')}.` })),
  uscs: list(z.enum(USCS_SYMBOLS, { error: 'Use an ASTM D2487 group symbol such as CH, CL, ML, OH or Pt.' })),
  method: list(z.enum(TEST_METHODS, { error: `Test method is one of: ${TEST_METHODS.join(', ')}.` })),
  quality: list(
    z.coerce.number().int().min(1, 'Sample quality classes are 1 to 4.').max(4, 'Sample quality classes are 1 to 4.'),
  ),
  origin: list(z.enum(ORIGINS, { error: 'Origin is own (your firm’s records) or pooled (everyone else’s).' })),
  version: list(z.coerce.number().int('A bank version is a whole number.').positive('A bank version is 1 or more.')),
  ...rangeShape,
});

export type BankSelection = z.output<typeof bankSelectionSchema>;

const SELECTION_KEYS = new Set<string>(['q', ...FACET_KEYS, ...BANK_PARAMETER_KEYS]);
const ARRAY_KEYS = new Set<string>(FACET_KEYS);

/**
 * Splits a query string into the selection's raw values (facets as arrays) and everything else (paging,
 * sort, columns…), which the caller validates with its own strict schema.
 */
export function splitSelectionParams(params: URLSearchParams): { selection: Record<string, unknown>; rest: URLSearchParams } {
  const selection: Record<string, unknown> = {};
  const rest = new URLSearchParams();
  for (const key of new Set(params.keys())) {
    const values = params.getAll(key);
    if (!SELECTION_KEYS.has(key)) {
      for (const value of values) rest.append(key, value);
    } else if (ARRAY_KEYS.has(key)) {
      selection[key] = values.flatMap((value) => value.split(',')).filter((value) => value !== '');
    } else {
      selection[key] = values.length === 1 ? values[0] : values;
    }
  }
  return { selection, rest };
}

function formatRange(range: NumericRange): string {
  return `${range.min ?? ''}..${range.max ?? ''}`;
}

/**
 * The canonical query string of a selection: keys in a fixed order, facet values sorted and unique,
 * empty parts left out. Equal selections give equal strings (used in links and as a cache key).
 */
export function selectionToSearchParams(selection: BankSelection): URLSearchParams {
  const params = new URLSearchParams();
  if (selection.q) params.append('q', selection.q);
  for (const key of FACET_KEYS) {
    const values = selection[key] as readonly (string | number)[] | undefined;
    if (!values?.length) continue;
    const unique = [...new Set(values.map(String))].sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
    for (const value of unique) params.append(key, value);
  }
  for (const key of BANK_PARAMETER_KEYS) {
    const range = selection[key];
    if (range && (range.min !== undefined || range.max !== undefined)) params.append(key, formatRange(range));
  }
  return params;
}

/** Parses a whole selection from a query string; other keys are refused (strict). */
export function parseBankSelection(params: URLSearchParams) {
  const { selection, rest } = splitSelectionParams(params);
  return bankSelectionSchema.safeParse({ ...Object.fromEntries(rest), ...selection });
}
