/**
 * A stable cache key for statistics: the same bank version, selection, quality filter and options
 * give the same key whatever the order of keys or list entries, the spelling of defaults, or -0/0;
 * anything that changes a figure changes the key. The key is canonical JSON behind a prefix that
 * carries the algorithm version, so changing the computation invalidates old entries.
 */
import { DEFAULT_DISCLOSURE_RULE, type DisclosureRule } from './disclosure';
import { StatisticsInputError } from './errors';
import { DEFAULT_QUALITY_WEIGHTS, QUALITY_CHOICES, type QualityOptions } from './quality';

/** Bump when any figure would come out differently for the same input. */
export const STATISTICS_ALGORITHM_VERSION = 1;

export type KeyValue = string | number | boolean | null | undefined | readonly KeyValue[] | { readonly [key: string]: KeyValue };

export interface CacheKeyInput {
  bankVersionId: number;
  /** The bank browser's selection (facets, ranges, free text), as parsed from the query string. */
  selection: Readonly<Record<string, KeyValue>>;
  quality?: QualityOptions;
  rule?: Partial<DisclosureRule>;
  /** Whose own data the result carries (null for none). */
  viewerFirmId: string | null;
  /** Anything else that shapes the result (pairs, band level, profile parameters…). */
  options?: Readonly<Record<string, KeyValue>>;
}

type Canonical = string | number | boolean | Canonical[] | { [key: string]: Canonical };

function canonical(value: KeyValue, path: string): Canonical | undefined {
  if (value === undefined || value === null || value === '') return undefined;
  if (typeof value === 'string') return value.normalize('NFC');
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new StatisticsInputError(`${path} must be a finite number.`);
    return value === 0 ? 0 : value;
  }
  if (typeof value === 'boolean') return value;
  if (Array.isArray(value)) {
    const items = value
      .map((item, i) => canonical(item, `${path}[${i}]`))
      .filter((item): item is Canonical => item !== undefined)
      .map((item) => [JSON.stringify(item), item] as const)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .filter(([text], i, all) => i === 0 || all[i - 1]?.[0] !== text)
      .map(([, item]) => item);
    return items.length ? items : undefined;
  }
  const out: { [key: string]: Canonical } = {};
  for (const key of Object.keys(value).sort()) {
    const item = canonical((value as Record<string, KeyValue>)[key], `${path}.${key}`);
    if (item !== undefined) out[key] = item;
  }
  return Object.keys(out).length ? out : undefined;
}

function qualityKey(quality: QualityOptions = {}): KeyValue {
  const include = [...(quality.include ?? QUALITY_CHOICES)];
  const weighting = quality.weighting ?? 'equal';
  if (weighting === 'equal') return { include, weighting };
  const weights = Object.fromEntries(include.map((c) => [String(c), quality.weights?.[c] ?? DEFAULT_QUALITY_WEIGHTS[c]]));
  return { include, weighting, weights };
}

export function statisticsCacheKey(input: CacheKeyInput): string {
  if (!Number.isInteger(input.bankVersionId) || input.bankVersionId < 0) {
    throw new StatisticsInputError('bankVersionId must be a whole number ≥ 0.');
  }
  const body = canonical(
    {
      selection: input.selection,
      quality: qualityKey(input.quality),
      rule: { ...DEFAULT_DISCLOSURE_RULE, ...input.rule },
      viewer: input.viewerFirmId,
      options: input.options,
    },
    'key',
  );
  return `statistics:v${STATISTICS_ALGORITHM_VERSION}:bank${input.bankVersionId}:${JSON.stringify(body ?? {})}`;
}
