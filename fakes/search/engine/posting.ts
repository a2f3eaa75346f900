import { TypedFastBitSet } from 'typedfastbitset';

/** Above this many documents a posting list becomes a bitset (small lists stay arrays to save memory). */
const BITSET_FROM = 256;

/** The documents holding one value: a short array, or a bitset once it grows. */
export class Posting {
  private ids: number[] | null = [];
  private bits: TypedFastBitSet | null = null;
  private count = 0;

  get size(): number {
    return this.count;
  }

  add(id: number): void {
    if (this.bits) {
      if (this.bits.checkedAdd(id)) this.count += 1;
      return;
    }
    const ids = this.ids as number[];
    if (ids.includes(id)) return;
    ids.push(id);
    this.count += 1;
    if (ids.length > BITSET_FROM) {
      this.bits = new TypedFastBitSet(ids);
      this.ids = null;
    }
  }

  remove(id: number): void {
    if (this.bits) {
      if (this.bits.has(id)) {
        this.bits.remove(id);
        this.count -= 1;
      }
      return;
    }
    const ids = this.ids as number[];
    const at = ids.indexOf(id);
    if (at < 0) return;
    ids[at] = ids[ids.length - 1] as number;
    ids.pop();
    this.count -= 1;
  }

  has(id: number): boolean {
    return this.bits ? this.bits.has(id) : (this.ids as number[]).includes(id);
  }

  /** Adds every id of this posting to `target`. */
  addTo(target: TypedFastBitSet): void {
    if (this.bits) target.union(this.bits);
    else for (const id of this.ids as number[]) target.add(id);
  }

  /** How many ids of this posting are in `set`. */
  countIn(set: TypedFastBitSet): number {
    if (this.bits) return this.bits.intersection_size(set);
    let n = 0;
    for (const id of this.ids as number[]) if (set.has(id)) n += 1;
    return n;
  }

  forEach(fn: (id: number) => void): void {
    if (this.bits) this.bits.forEach(fn);
    else for (const id of this.ids as number[]) fn(id);
  }

  toBitSet(): TypedFastBitSet {
    return this.bits ? this.bits.clone() : new TypedFastBitSet(this.ids as number[]);
  }
}
