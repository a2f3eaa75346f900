/**
 * Numeric range filters of a selection (e.g. Cc 0.4–0.8), applied to the same values the pooled figures
 * use: other firms' tests by their masked values, the viewer's own by their true values. Filtering
 * other firms' tests by true values would let the count n answer "is this test's Cc below v?", and a
 * bisection on v would read the value back exactly; against masked values it reads back only the
 * masked value. Depth is not masked and filters as it is.
 */
import type { SelectionColumns } from './columns';
import { StatisticsInputError } from './errors';
import { maskedValues } from './masking';
import type { ParameterKey } from './parameters';

export interface ValueRange {
  min?: number;
  max?: number;
}

export type ValueRanges = Partial<Record<ParameterKey | 'depthM', ValueRange>>;

/** Keeps the rows inside every range (bounds inclusive; a missing value fails a range on it). */
export function filterByValueRanges(
  columns: SelectionColumns,
  ranges: ValueRanges,
  viewerFirmId: string | null,
): SelectionColumns {
  const viewer = viewerFirmId === null ? -1 : columns.firmIds.indexOf(viewerFirmId);
  const checks = Object.entries(ranges).map(([key, range]) => {
    const min = range?.min ?? Number.NEGATIVE_INFINITY;
    const max = range?.max ?? Number.POSITIVE_INFINITY;
    if (Number.isNaN(min) || Number.isNaN(max) || min > max)
      throw new StatisticsInputError(`The range of ${key} must have min ≤ max.`);
    if (key === 'depthM') return { raw: columns.depthM, masked: columns.depthM, min, max };
    const raw = columns.values[key as ParameterKey];
    const masked = maskedValues(columns, key as ParameterKey);
    return { raw: raw ?? null, masked, min, max };
  });
  const keep = new Uint32Array(columns.length);
  let count = 0;
  for (let i = 0; i < columns.length; i++) {
    const own = columns.firmIndex[i] === viewer;
    let inside = true;
    for (const check of checks) {
      const source = own ? check.raw : check.masked;
      const x = source ? (source[i] as number) : Number.NaN;
      if (!(x >= check.min && x <= check.max)) {
        inside = false;
        break;
      }
    }
    if (inside) keep[count++] = i;
  }
  const rows = keep.subarray(0, count);
  const pick = <T extends Float64Array | Uint32Array | Uint8Array>(array: T): T => {
    const out = new (array.constructor as new (n: number) => T)(count);
    for (let j = 0; j < count; j++) out[j] = array[rows[j] as number] as number;
    return out;
  };
  const values: Partial<Record<ParameterKey, Float64Array>> = {};
  for (const [key, array] of Object.entries(columns.values)) if (array) values[key as ParameterKey] = pick(array);
  return {
    length: count,
    firmIds: columns.firmIds,
    firmIndex: pick(columns.firmIndex),
    recordKey: pick(columns.recordKey),
    depthM: pick(columns.depthM),
    qualityClass: pick(columns.qualityClass),
    soilGroup: pick(columns.soilGroup),
    values,
  };
}
