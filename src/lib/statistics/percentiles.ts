/**
 * Percentiles of sorted values.
 *
 * Unweighted: Hyndman & Fan (1996) type 7, "Sample quantiles in statistical packages", The American
 * Statistician 50(4):361–365 — the k-th smallest of n values sits at probability (k − 1)/(n − 1) and
 * values between are interpolated linearly (R's and NumPy's default, spreadsheet PERCENTILE.INC).
 *
 * Weighted (sample quality weights): our generalisation of type 7 — the k-th smallest value sits at
 * p_k = W_{k−1}/W_{n−1}, W_j being the sum of the weights of the j smallest values, with linear
 * interpolation between. Equal weights give exactly type 7; a heavier test pulls the percentiles
 * towards itself. Tied values are ordered better quality class first.
 */

/** Type-7 percentile (p in [0, 1]) of the first n entries of an ascending array, n ≥ 1. */
export function percentileSorted(sorted: ArrayLike<number>, p: number, n = sorted.length): number {
  if (n === 1) return sorted[0] as number;
  const h = (n - 1) * p;
  const k = Math.floor(h);
  const low = sorted[k] as number;
  if (k >= n - 1) return sorted[n - 1] as number;
  return low + (h - k) * ((sorted[k + 1] as number) - low);
}

/** A run of ascending values sharing one weight (the tests of one quality class). */
export interface WeightedRun {
  values: Float64Array;
  weight: number;
}

/**
 * Weighted percentiles (ascending `probabilities` in [0, 1]) over runs that are each sorted, merged in
 * one pass. Runs listed in class order; empty runs are allowed; at least one value in all.
 */
export function weightedPercentilesOfRuns(runs: readonly WeightedRun[], probabilities: readonly number[]): number[] {
  const live = runs.filter((r) => r.values.length > 0);
  let total = 0;
  let lastValue = Number.NEGATIVE_INFINITY;
  let lastWeight = 0;
  for (const run of live) {
    total += run.weight * run.values.length;
    const top = run.values[run.values.length - 1] as number;
    if (top >= lastValue) {
      lastValue = top;
      lastWeight = run.weight;
    }
  }
  const heads = new Int32Array(live.length);
  const results: number[] = new Array(probabilities.length);
  const count = live.reduce((s, r) => s + r.values.length, 0);
  if (count === 1) return results.fill(lastValue);
  const span = total - lastWeight;
  let target = 0;
  let before = 0;
  let previousValue = Number.NaN;
  let previousPosition = 0;
  for (let k = 0; k < count && target < probabilities.length; k++) {
    let best = -1;
    for (let r = 0; r < live.length; r++) {
      const head = heads[r] as number;
      const run = live[r] as WeightedRun;
      if (head >= run.values.length) continue;
      if (best < 0 || (run.values[head] as number) < ((live[best] as WeightedRun).values[heads[best] as number] as number))
        best = r;
    }
    const run = live[best] as WeightedRun;
    const value = run.values[heads[best] as number] as number;
    heads[best] = (heads[best] as number) + 1;
    const position = k === count - 1 ? 1 : before / span;
    while (target < probabilities.length && (probabilities[target] as number) <= position) {
      const p = probabilities[target] as number;
      results[target] =
        k === 0 || position === previousPosition
          ? value
          : previousValue + ((p - previousPosition) / (position - previousPosition)) * (value - previousValue);
      target++;
    }
    before += run.weight;
    previousValue = value;
    previousPosition = position;
  }
  return results;
}
