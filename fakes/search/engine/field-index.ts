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
  private sortedNumbers: { values: Float64Array; ids: Int32Array } | null = null;
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
      this.sortedNumbers = null;
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
      this.numFirst[id] = Number.NaN;
      this.numExtra.delete(id);
      this.numberCount -= 1;
      this.sortedNumbers = null;
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

  /** Every (number, document) pair sorted by number: for ranges, stats and ordered facet walks. */
  numbersSorted(): { values: Float64Array; ids: Int32Array } {
    if (this.sortedNumbers) return this.sortedNumbers;
    const pairs: Array<[number, number]> = [];
    for (let id = 0; id < this.numFirst.length; id += 1) {
      const first = this.numFirst[id] as number;
      if (Number.isNaN(first)) continue;
      pairs.push([first, id]);
      for (const n of this.numExtra.get(id) ?? []) pairs.push([n, id]);
    }
    pairs.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    const values = new Float64Array(pairs.length);
    const ids = new Int32Array(pairs.length);
    pairs.forEach(([v, id], i) => {
      values[i] = v;
      ids[i] = id;
    });
    this.sortedNumbers = { values, ids };
    return this.sortedNumbers;
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
