/**
 * The rows of one selection, column by column: typed arrays, one slot per test record, NaN where a
 * value is missing. This is the only input the statistics need; the server fills it straight from
 * the rows PostgreSQL streams (no object per row is kept).
 */
import { StatisticsInputError } from './errors';
import { PARAMETER_KEYS, type ParameterKey } from './parameters';
import { soilGroupCode, soilGroupOfUscs } from './soil-groups';

export interface SelectionColumns {
  readonly length: number;
  /** Distinct firm ids; `firmIndex` points into this list. */
  readonly firmIds: readonly string[];
  readonly firmIndex: Uint32Array;
  /**
   * Secret, permanent 32-bit key per record that drives its masking (masking.ts). The server derives
   * it from the record id with a keyed hash (e.g. the first 4 bytes of HMAC-SHA-256(secret, id)); the
   * same record must always get the same key.
   */
  readonly recordKey: Uint32Array;
  /** Mid-depth of the specimen, m below ground. */
  readonly depthM: Float64Array;
  /** Sample quality class 1–4, 0 when not known. */
  readonly qualityClass: Uint8Array;
  /** Soil group code (soil-groups.ts), 0 when not known. */
  readonly soilGroup: Uint8Array;
  /** Values per parameter, SI units, NaN where missing. Parameters left out count as all missing. */
  readonly values: Readonly<Partial<Record<ParameterKey, Float64Array>>>;
}

/** One record as a plain object, for small selections and tests (the server may fill columns directly). */
export type StatisticsRecord = {
  firmId: string;
  recordKey: number;
  depthM: number;
  sampleQualityClass?: number | null;
  uscsSymbol?: string | null;
} & Partial<Record<ParameterKey, number | null>>;

/** Checks lengths and codes; throws StatisticsInputError naming what is wrong. */
export function checkColumns(columns: SelectionColumns): void {
  const n = columns.length;
  if (!Number.isInteger(n) || n < 0) throw new StatisticsInputError('The selection length must be a whole number ≥ 0.');
  const named: [string, { length: number }][] = [
    ['firmIndex', columns.firmIndex],
    ['recordKey', columns.recordKey],
    ['depthM', columns.depthM],
    ['qualityClass', columns.qualityClass],
    ['soilGroup', columns.soilGroup],
    ...Object.entries(columns.values).map(([k, v]) => [k, v ?? { length: n }] as [string, { length: number }]),
  ];
  for (const [name, array] of named) {
    if (array.length !== n) throw new StatisticsInputError(`Column ${name} has ${array.length} entries; the selection has ${n}.`);
  }
  for (let i = 0; i < n; i++) {
    if ((columns.firmIndex[i] as number) >= columns.firmIds.length) {
      throw new StatisticsInputError(
        `Row ${i} names firm index ${columns.firmIndex[i]}, beyond the ${columns.firmIds.length} firms listed.`,
      );
    }
    if ((columns.qualityClass[i] as number) > 4) throw new StatisticsInputError(`Row ${i} has a sample quality class above 4.`);
  }
}

/** Builds columns from plain records (`keys`: the parameters to keep, all by default). */
export function columnsFromRecords(
  records: readonly StatisticsRecord[],
  keys: readonly ParameterKey[] = PARAMETER_KEYS,
): SelectionColumns {
  const n = records.length;
  const firmIds: string[] = [];
  const firmLookup = new Map<string, number>();
  const firmIndex = new Uint32Array(n);
  const recordKey = new Uint32Array(n);
  const depthM = new Float64Array(n);
  const qualityClass = new Uint8Array(n);
  const soilGroup = new Uint8Array(n);
  const values: Partial<Record<ParameterKey, Float64Array>> = {};
  for (const key of keys) values[key] = new Float64Array(n).fill(Number.NaN);
  records.forEach((record, i) => {
    let firm = firmLookup.get(record.firmId);
    if (firm === undefined) {
      firm = firmIds.length;
      firmIds.push(record.firmId);
      firmLookup.set(record.firmId, firm);
    }
    firmIndex[i] = firm;
    recordKey[i] = record.recordKey >>> 0;
    depthM[i] = record.depthM;
    const quality = record.sampleQualityClass ?? 0;
    if (!Number.isInteger(quality) || quality < 0 || quality > 4) {
      throw new StatisticsInputError(`Record ${i} has sample quality class ${quality}; use 1–4 or null.`);
    }
    qualityClass[i] = quality;
    soilGroup[i] = soilGroupCode(soilGroupOfUscs(record.uscsSymbol));
    for (const key of keys) {
      const value = record[key];
      if (typeof value === 'number' && Number.isFinite(value)) (values[key] as Float64Array)[i] = value;
    }
  });
  return { length: n, firmIds, firmIndex, recordKey, depthM, qualityClass, soilGroup, values };
}

/** The column of one parameter, or null when the selection does not carry it. */
export function valuesOf(columns: SelectionColumns, key: ParameterKey): Float64Array | null {
  return columns.values[key] ?? null;
}

/** Index of a firm in the selection, or −1 when it has no rows there (or is null). */
export function firmIndexOf(columns: SelectionColumns, firmId: string | null): number {
  return firmId === null ? -1 : columns.firmIds.indexOf(firmId);
}
