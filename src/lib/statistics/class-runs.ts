/**
 * Values gathered by sample quality class into one buffer, so that a weighted summary can sort each
 * class once and merge (percentiles.ts), and an unweighted one can select its percentiles from the
 * whole buffer (order-statistics.ts).
 */
import type { WeightedRun } from './percentiles';

export class ClassRuns {
  readonly buffer: Float64Array;
  private readonly starts = new Int32Array(6);
  private readonly next = new Int32Array(5);

  /** `countsByClass[c]`: how many values of class code c (0 = unknown, 1–4) will be pushed. */
  constructor(countsByClass: ArrayLike<number>) {
    let offset = 0;
    for (let c = 0; c < 5; c++) {
      this.starts[c] = offset;
      this.next[c] = offset;
      offset += countsByClass[c] as number;
    }
    this.starts[5] = offset;
    this.buffer = new Float64Array(offset);
  }

  get length(): number {
    return this.buffer.length;
  }

  push(classCode: number, value: number): void {
    const at = this.next[classCode] as number;
    this.buffer[at] = value;
    this.next[classCode] = at + 1;
  }

  /**
   * The values as runs with their class weights (`weights[c]`), unsorted: unweighted, the whole
   * buffer as one run of weight 1; weighted, one run per class, better classes first and unknown last.
   */
  runs(weights: ArrayLike<number>, weighted: boolean): WeightedRun[] {
    if (!weighted) return [{ values: this.buffer, weight: 1 }];
    const runs: WeightedRun[] = [];
    for (let c = 1; c <= 5; c++) {
      const code = c % 5;
      runs.push({
        values: this.buffer.subarray(this.starts[code] as number, this.starts[code + 1] as number),
        weight: weights[code] as number,
      });
    }
    return runs;
  }
}
