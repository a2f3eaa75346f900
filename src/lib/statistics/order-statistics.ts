/**
 * Type-7 percentiles without a full sort: the few order statistics they need are found by
 * quickselect (Hoare 1961, "Algorithm 65: Find", CACM 4(7):321 — from memory), each inside the
 * part of the array the previous ones left, so five percentiles of n values cost a few passes of n.
 */

/** Rearranges a[lo..hi] so that a[k] holds the value it would hold if a[lo..hi] were sorted. */
function select(a: Float64Array, k: number, lo: number, hi: number): void {
  let left = lo;
  let right = hi;
  while (right > left) {
    const mid = (left + right) >>> 1;
    const x = a[left] as number;
    const y = a[mid] as number;
    const z = a[right] as number;
    const pivot = Math.max(Math.min(x, y), Math.min(Math.max(x, y), z));
    let i = left;
    let j = right;
    while (i <= j) {
      while ((a[i] as number) < pivot) i++;
      while ((a[j] as number) > pivot) j--;
      if (i <= j) {
        const t = a[i] as number;
        a[i] = a[j] as number;
        a[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}

/** Places every rank of `ranks` (ascending, distinct, within 0..n−1) in a[0..n−1] as a sort would. */
function selectRanks(a: Float64Array, ranks: readonly number[], from: number, to: number, lo: number, hi: number): void {
  if (from > to) return;
  const middle = (from + to) >>> 1;
  const k = ranks[middle] as number;
  select(a, k, lo, hi);
  selectRanks(a, ranks, from, middle - 1, lo, k - 1);
  selectRanks(a, ranks, middle + 1, to, k + 1, hi);
}

/**
 * Type-7 percentiles (probabilities in [0, 1]) of the first n values of `a` (n ≥ 1), which it
 * reorders. Same results as sorting and interpolating (percentiles.ts). Only the lower order
 * statistic of each percentile is selected; the next one up is the smallest value between it and the
 * next selected rank, found by one scan.
 */
export function percentilesBySelection(a: Float64Array, probabilities: readonly number[], n = a.length): number[] {
  const last = n - 1;
  const ranks = [...new Set(probabilities.map((p) => Math.floor(last * p)))].sort((x, y) => x - y);
  selectRanks(a, ranks, 0, ranks.length - 1, 0, last);
  return probabilities.map((p) => {
    const h = last * p;
    const k = Math.floor(h);
    const low = a[k] as number;
    if (k >= last || h === k) return low;
    const bound = ranks.find((r) => r > k) ?? last;
    let next = Number.POSITIVE_INFINITY;
    for (let i = k + 1; i <= bound; i++) if ((a[i] as number) < next) next = a[i] as number;
    return low + (h - k) * (next - low);
  });
}
