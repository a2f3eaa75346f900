/**
 * Percentiles of Monte Carlo outputs: Hyndman & Fan (1996) type 7 (linear interpolation between
 * order statistics, the default of R, NumPy and spreadsheet PERCENTILE.INC), found by
 * quickselect in O(n) instead of a full sort.
 */

export interface Quantiles {
  p10: number;
  p50: number;
  p90: number;
}

/** Rearranges a[lo..hi] so that a[k] holds the k-th smallest value (Hoare's quickselect). */
function select(a: Float64Array, k: number, lo: number, hi: number): void {
  while (hi > lo) {
    const mid = (lo + hi) >>> 1;
    let pivot = a[mid] as number;
    const x = a[lo] as number;
    const y = a[hi] as number;
    if ((x <= pivot && pivot <= y) || (y <= pivot && pivot <= x)) {
      // median of three is already the middle value
    } else if ((pivot <= x && x <= y) || (y <= x && x <= pivot)) pivot = x;
    else pivot = y;
    let i = lo;
    let j = hi;
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
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

/** Smallest value of a[from..to] (inclusive); +Infinity when empty. */
function minimum(a: Float64Array, from: number, to: number): number {
  let m = Number.POSITIVE_INFINITY;
  for (let i = from; i <= to; i++) if ((a[i] as number) < m) m = a[i] as number;
  return m;
}

/**
 * P10, P50 and P90 of `values` (left unchanged; `scratch`, if given, must be as long), n ≥ 1.
 * The median is selected first; P10 and P90 are then selected inside the two halves it leaves.
 */
export function tenFiftyNinety(values: ArrayLike<number>, scratch?: Float64Array): Quantiles {
  const n = values.length;
  const a = scratch && scratch.length === n ? scratch : new Float64Array(n);
  for (let i = 0; i < n; i++) a[i] = values[i] as number;
  const last = n - 1;
  const h50 = last * 0.5;
  const k50 = Math.floor(h50);
  select(a, k50, 0, last);
  const interpolate = (h: number, k: number, lowValue: number, upTo: number) =>
    h === k || k + 1 > last ? lowValue : lowValue + (h - k) * (minimum(a, k + 1, upTo) - lowValue);
  const p50 = interpolate(h50, k50, a[k50] as number, last);
  const h10 = last * 0.1;
  const k10 = Math.floor(h10);
  select(a, k10, 0, k50);
  const p10 = interpolate(h10, k10, a[k10] as number, k10 < k50 ? k50 : last);
  const h90 = last * 0.9;
  const k90 = Math.floor(h90);
  select(a, k90, k50, last);
  const p90 = interpolate(h90, k90, a[k90] as number, last);
  return { p10, p50, p90 };
}
