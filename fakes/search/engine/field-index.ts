// One field's facet data: posting lists per string value, per-document columns, numbers sorted
// for ranges, and the exists / null / empty sets.
import { TypedFastBitSet } from 'typedfastbitset';
import { normalizeFacet } from '../text/normalize';
import type { FieldFacts } from './documents';
import { Posting } from './posting';

export interface StringKey {
  normalized: string;
  posting: Posting;
  /** Original spellings and how many documents use each (the first still in use is shown). */
  originals: Map<string, number>;
}

function grow<T extends Float64Array | Int32Array>(array: T, needed: number, fill: number): T {
  if (needed < array.length) return array;
  let size = Math.max(16, array.length);
  while (size <= needed) size *= 2;
  const next = new (array.constructor as { new (n: number): T })(size);
  next.fill(fill);
  next.set(array);
  return next;
}

export class FieldIndex {
  readonly exists = new TypedFastBitSet();
  readonly nulls = new TypedFastBitSet();
  readonly empties = new TypedFastBitSet();
  readonly keys: StringKey[] = [];
  private readonly keyIds = new Map<string, number>();
  /** First string key of each document (-1 none); further keys in `strExtra`. */
  strFirst: Int32Array = new Int32Array(0);
  readonly strExtra = new Map<number, number[]>();
  /** First number of each document (NaN none); further numbers in `numExtra`. */
  numFirst: Float64Array = new Float64Array(0);
  readonly numExtra = new Map<number, number[]>();
  /** (number, document) pairs sorted by number then document; kept up to date once built. */
  private sortedValues: Float64Array | null = null;
  private sortedIds: Int32Array = new Int32Array(0);
  private sortedLength = 0;
  private editsSinceBuild = 0;
  private sortedKeyIds: number[] | null = null;
  numberCount = 0;

  add(id: number, facts: FieldFacts): void {
    this.exists.add(id);
    if (facts.isNull) this.nulls.add(id);
    if (facts.isEmpty) this.empties.add(id);
    if (facts.strings.length) {
      this.strFirst = grow(this.strFirst, id, -1);
      const ids = [...new Set(facts.strings.map((s) => this.keyFor(s)))];
      facts.strings.forEach((original, i) => {
        const key = this.keys[this.keyFor(original)] as StringKey;
        if (facts.strings.indexOf(original) === i) key.originals.set(original, (key.originals.get(original) ?? 0) + 1);
      });
      for (const keyId of ids) (this.keys[keyId] as StringKey).posting.add(id);
      this.strFirst[id] = ids[0] as number;
      if (ids.length > 1) this.strExtra.set(id, ids.slice(1));
    }
    if (facts.numbers.length) {
      this.numFirst = grow(this.numFirst, id, Number.NaN);
      const numbers = [...new Set(facts.numbers)];
      this.numFirst[id] = numbers[0] as number;
      if (numbers.length > 1) this.numExtra.set(id, numbers.slice(1));
      this.numberCount += 1;
      if (this.keepSorted(numbers.length)) for (const n of numbers) this.insertSorted(n, id);
    }
  }

  remove(id: number, facts: FieldFacts): void {
    this.exists.remove(id);
    this.nulls.remove(id);
    this.empties.remove(id);
    if (facts.strings.length) {
      for (const original of new Set(facts.strings)) {
        const key = this.keys[this.keyFor(original)] as StringKey;
        key.posting.remove(id);
        const left = (key.originals.get(original) ?? 1) - 1;
        if (left > 0) key.originals.set(original, left);
        else key.originals.delete(original);
      }
      this.strFirst[id] = -1;
      this.strExtra.delete(id);
    }
    if (facts.numbers.length) {
      const numbers = this.numbersOf(id);
      this.numFirst[id] = Number.NaN;
      this.numExtra.delete(id);
      this.numberCount -= 1;
      if (this.keepSorted(numbers.length)) for (const n of numbers) this.removeSorted(n, id);
    }
  }

  private keyFor(original: string): number {
    const normalized = normalizeFacet(original);
    let keyId = this.keyIds.get(normalized);
    if (keyId === undefined) {
      keyId = this.keys.length;
      this.keys.push({ normalized, posting: new Posting(), originals: new Map() });
      this.keyIds.set(normalized, keyId);
      this.sortedKeyIds = null;
    }
    return keyId;
  }

  keyId(normalized: string): number | undefined {
    return this.keyIds.get(normalized);
  }

  /** The string keys of a document. */
  keysOf(id: number): number[] {
    const first = id < this.strFirst.length ? (this.strFirst[id] as number) : -1;
    if (first < 0) return [];
    const extra = this.strExtra.get(id);
    return extra ? [first, ...extra] : [first];
  }

  /** The numbers of a document. */
  numbersOf(id: number): number[] {
    const first = id < this.numFirst.length ? (this.numFirst[id] as number) : Number.NaN;
    if (Number.isNaN(first)) return [];
    const extra = this.numExtra.get(id);
    return extra ? [first, ...extra] : [first];
  }

  /** Whether to update the sorted pairs in place (few edits) or drop them for a rebuild (bulk loads). */
  private keepSorted(count: number): boolean {
    if (!this.sortedValues) return false;
    this.editsSinceBuild += count;
    if (this.editsSinceBuild <= 5000) return true;
    this.sortedValues = null;
    return false;
  }

  private insertSorted(value: number, id: number): void {
    let values = this.sortedValues as Float64Array;
    if (this.sortedLength === values.length) {
      const grown = new Float64Array(values.length * 2 + 16);
      grown.set(values);
      const ids = new Int32Array(grown.length);
      ids.set(this.sortedIds);
      this.sortedValues = grown;
      this.sortedIds = ids;
      values = grown;
    }
    let at = lowerBound(values.subarray(0, this.sortedLength), value, true);
    while (at < this.sortedLength && values[at] === value && (this.sortedIds[at] as number) < id) at += 1;
    values.copyWithin(at + 1, at, this.sortedLength);
    this.sortedIds.copyWithin(at + 1, at, this.sortedLength);
    values[at] = value;
    this.sortedIds[at] = id;
    this.sortedLength += 1;
  }

  private removeSorted(value: number, id: number): void {
    const values = this.sortedValues as Float64Array;
    let at = lowerBound(values.subarray(0, this.sortedLength), value, false);
    while (at < this.sortedLength && values[at] === value && this.sortedIds[at] !== id) at += 1;
    if (at >= this.sortedLength || values[at] !== value) return;
    values.copyWithin(at, at + 1, this.sortedLength);
    this.sortedIds.copyWithin(at, at + 1, this.sortedLength);
    this.sortedLength -= 1;
  }

  /** Every (number, document) pair sorted by number: for ranges, stats and ordered facet walks. */
  numbersSorted(): { values: Float64Array; ids: Int32Array } {
    if (!this.sortedValues) {
      const rawValues: number[] = [];
      const rawIds: number[] = [];
      for (let id = 0; id < this.numFirst.length; id += 1) {
        const first = this.numFirst[id] as number;
        if (Number.isNaN(first)) continue;
        rawValues.push(first);
        rawIds.push(id);
        for (const n of this.numExtra.get(id) ?? []) {
          rawValues.push(n);
          rawIds.push(id);
        }
      }
      const order = new Uint32Array(rawValues.length).map((_, i) => i);
      order.sort((a, b) => (rawValues[a] as number) - (rawValues[b] as number) || (rawIds[a] as number) - (rawIds[b] as number));
      const capacity = order.length + 1024;
      this.sortedValues = new Float64Array(capacity);
      this.sortedIds = new Int32Array(capacity);
      order.forEach((from, i) => {
        (this.sortedValues as Float64Array)[i] = rawValues[from] as number;
        this.sortedIds[i] = rawIds[from] as number;
      });
      this.sortedLength = order.length;
      this.editsSinceBuild = 0;
    }
    return { values: this.sortedValues.subarray(0, this.sortedLength), ids: this.sortedIds.subarray(0, this.sortedLength) };
  }

  /** String key ids in ascending order of their normalized value. */
  keysSorted(): number[] {
    if (!this.sortedKeyIds) {
      const ids = this.keys.map((_, i) => i);
      ids.sort((a, b) => compareText((this.keys[a] as StringKey).normalized, (this.keys[b] as StringKey).normalized));
      this.sortedKeyIds = ids;
    }
    return this.sortedKeyIds;
  }

  /** The spelling shown for a key in facet counts. */
  displayOf(keyId: number): string {
    const key = this.keys[keyId] as StringKey;
    const first = key.originals.keys().next();
    return first.done ? key.normalized : first.value;
  }
}

/** Byte-order comparison of UTF-8 text (code point order), as the engine's keys are compared. */
export function compareText(a: string, b: string): number {
  if (a === b) return 0;
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i += 1) {
    const x = a.codePointAt(i) as number;
    const y = b.codePointAt(i) as number;
    if (x !== y) return x < y ? -1 : 1;
    if (x > 0xffff) i += 1;
  }
  return a.length - b.length;
}

/** First index in `values` with value >= bound (or > bound when `strict`). */
export function lowerBound(values: Float64Array, bound: number, strict: boolean): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    const v = values[mid] as number;
    if (v < bound || (strict && v === bound)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
