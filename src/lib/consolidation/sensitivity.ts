/**
 * Which sampled inputs drive the spread of an output: Spearman's rank correlation ρ of each input
 * with the output (Spearman 1904), and each input's share ρ²/Σρ² of the squared rank
 * correlations. Shares are a ranking aid, not a variance decomposition: correlated inputs (such
 * as Cc and e0) share credit.
 */

/** The method statement returned with the drivers. */
export const DRIVER_METHOD =
  'Spearman rank correlation of each sampled input with the output; share = ρ²/Σρ² (correlated inputs share credit)';

/**
 * Mid-ranks (1…n, ties averaged) of `values` into `out`; `sorted` is scratch of the same length.
 * One native sort, then a lower-bound binary search per value (and an upper bound only on ties).
 */
export function midRanks(values: Float64Array, sorted: Float64Array, out: Float64Array): void {
  sorted.set(values);
  sorted.sort();
  const n = values.length;
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if ((sorted[mid] as number) < v) lo = mid + 1;
      else hi = mid;
    }
    let upper = lo + 1;
    if (upper < n && (sorted[upper] as number) === v) {
      hi = n;
      while (upper < hi) {
        const mid = (upper + hi) >>> 1;
        if ((sorted[mid] as number) <= v) upper = mid + 1;
        else hi = mid;
      }
    }
    out[i] = (lo + upper + 1) / 2;
  }
}

/** Pearson correlation of two equally long arrays (0 when either has no spread). */
export function pearson(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i] as number;
    my += y[i] as number;
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (x[i] as number) - mx;
    const dy = (y[i] as number) - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : 0;
}

export interface DriverInput {
  layer: string;
  parameter: string;
  values: Float64Array;
}

export interface Driver {
  layer: string;
  parameter: string;
  rankCorrelation: number;
  share: number;
}

/**
 * For each output, the inputs ranked by |ρ| with it, largest first. Each input is ranked once.
 */
export function rankDrivers(inputs: readonly DriverInput[], outputs: readonly Float64Array[]): Driver[][] {
  const n = outputs[0]?.length ?? 0;
  const sorted = new Float64Array(n);
  const outputRanks = outputs.map((output) => {
    const ranks = new Float64Array(n);
    midRanks(output, sorted, ranks);
    return ranks;
  });
  const inputRanks = new Float64Array(n);
  const rho = outputs.map(() => [] as number[]);
  for (const input of inputs) {
    midRanks(input.values, sorted, inputRanks);
    outputRanks.forEach((ranks, k) => {
      rho[k]?.push(pearson(inputRanks, ranks));
    });
  }
  return rho.map((list) => {
    const total = list.reduce((sum, r) => sum + r * r, 0);
    return inputs
      .map((input, i) => {
        const r = list[i] as number;
        return { layer: input.layer, parameter: input.parameter, rankCorrelation: r, share: total > 0 ? (r * r) / total : 0 };
      })
      .sort((a, b) => Math.abs(b.rankCorrelation) - Math.abs(a.rankCorrelation));
  });
}
