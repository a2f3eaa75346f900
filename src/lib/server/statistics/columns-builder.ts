/**
 * Fills the statistics core's `SelectionColumns` one streamed row at a time: typed arrays that grow
 * by doubling, cut to length at the end (exact-length buffers, so they can be moved to a worker
 * thread without copying). No object per row is kept.
 */
import { PARAMETER_KEYS, type ParameterKey, type SelectionColumns } from '../../statistics';
import { soilGroupCode, soilGroupOfUscs } from '../../statistics/soil-groups';

/** One row as the statistics query streams it (SI units; null where missing). */
export type SelectionRow = {
  firmId: string;
  recordKey: number;
  depthTopM: number;
  depthBottomM: number;
  sampleQualityClass: number | null;
  uscsSymbol: string | null;
} & Record<ParameterKey, number | null>;

const grow = <T extends Float64Array | Uint32Array | Uint8Array>(array: T, size: number): T => {
  const next = new (array.constructor as new (n: number) => T)(size);
  next.set(array);
  return next;
};

export class ColumnsBuilder {
  private length = 0;
  private capacity: number;
  private readonly firmIds: string[] = [];
  private readonly firmLookup = new Map<string, number>();
  private firmIndex: Uint32Array;
  private recordKey: Uint32Array;
  private depthM: Float64Array;
  private qualityClass: Uint8Array;
  private soilGroup: Uint8Array;
  private readonly soilCodes = new Map<string | null, number>();
  private values: Float64Array[];

  constructor(initialCapacity = 1024) {
    this.capacity = Math.max(16, initialCapacity);
    this.firmIndex = new Uint32Array(this.capacity);
    this.recordKey = new Uint32Array(this.capacity);
    this.depthM = new Float64Array(this.capacity);
    this.qualityClass = new Uint8Array(this.capacity);
    this.soilGroup = new Uint8Array(this.capacity);
    this.values = PARAMETER_KEYS.map(() => new Float64Array(this.capacity));
  }

  private enlarge(): void {
    this.capacity *= 2;
    this.firmIndex = grow(this.firmIndex, this.capacity);
    this.recordKey = grow(this.recordKey, this.capacity);
    this.depthM = grow(this.depthM, this.capacity);
    this.qualityClass = grow(this.qualityClass, this.capacity);
    this.soilGroup = grow(this.soilGroup, this.capacity);
    this.values = this.values.map((column) => grow(column, this.capacity));
  }

  push(row: SelectionRow): void {
    if (this.length === this.capacity) this.enlarge();
    const i = this.length++;
    let firm = this.firmLookup.get(row.firmId);
    if (firm === undefined) {
      firm = this.firmIds.length;
      this.firmIds.push(row.firmId);
      this.firmLookup.set(row.firmId, firm);
    }
    this.firmIndex[i] = firm;
    this.recordKey[i] = row.recordKey >>> 0;
    this.depthM[i] = (row.depthTopM + row.depthBottomM) / 2;
    const quality = row.sampleQualityClass;
    this.qualityClass[i] = quality !== null && quality >= 1 && quality <= 4 ? quality : 0;
    let soil = this.soilCodes.get(row.uscsSymbol);
    if (soil === undefined) {
      soil = soilGroupCode(soilGroupOfUscs(row.uscsSymbol));
      this.soilCodes.set(row.uscsSymbol, soil);
    }
    this.soilGroup[i] = soil;
    for (let k = 0; k < PARAMETER_KEYS.length; k++) {
      const value = row[PARAMETER_KEYS[k] as ParameterKey];
      (this.values[k] as Float64Array)[i] = value === null || !Number.isFinite(value) ? Number.NaN : value;
    }
  }

  finish(): SelectionColumns {
    const n = this.length;
    const values: Partial<Record<ParameterKey, Float64Array>> = {};
    PARAMETER_KEYS.forEach((key, k) => {
      values[key] = (this.values[k] as Float64Array).slice(0, n);
    });
    return {
      length: n,
      firmIds: this.firmIds,
      firmIndex: this.firmIndex.slice(0, n),
      recordKey: this.recordKey.slice(0, n),
      depthM: this.depthM.slice(0, n),
      qualityClass: this.qualityClass.slice(0, n),
      soilGroup: this.soilGroup.slice(0, n),
      values,
    };
  }
}

/** The buffers of the columns, to hand to a worker thread without copying. */
export function transferListOf(columns: SelectionColumns): ArrayBuffer[] {
  const arrays = [columns.firmIndex, columns.recordKey, columns.depthM, columns.qualityClass, columns.soilGroup];
  for (const column of Object.values(columns.values)) if (column) arrays.push(column);
  return arrays.map((array) => array.buffer as ArrayBuffer);
}
