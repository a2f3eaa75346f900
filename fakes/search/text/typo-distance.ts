// Edit distance with adjacent transpositions (optimal string alignment), optionally against the best
// prefix of the candidate word, stopping early once `max` is exceeded.

export function editDistance(query: string, word: string, max: number, asPrefix: boolean): number {
  const q = Array.from(query);
  const w = Array.from(word);
  const m = q.length;
  const n = asPrefix ? Math.min(w.length, m + max) : w.length;
  if (!asPrefix && Math.abs(m - n) > max) return max + 1;
  let prevPrev = new Array<number>(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  let best = asPrefix ? (m === 0 ? 0 : Number.POSITIVE_INFINITY) : 0;
  for (let i = 1; i <= m; i += 1) {
    const row = new Array<number>(n + 1);
    row[0] = i;
    let rowMin = row[0];
    for (let j = 1; j <= n; j += 1) {
      const cost = q[i - 1] === w[j - 1] ? 0 : 1;
      let v = Math.min((prev[j] as number) + 1, (row[j - 1] as number) + 1, (prev[j - 1] as number) + cost);
      if (i > 1 && j > 1 && q[i - 1] === w[j - 2] && q[i - 2] === w[j - 1]) v = Math.min(v, (prevPrev[j - 2] as number) + 1);
      row[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > max) return max + 1;
    prevPrev = prev;
    prev = row;
  }
  if (asPrefix) {
    for (let j = 0; j <= n; j += 1) best = Math.min(best, prev[j] as number);
    return best;
  }
  return prev[n] as number;
}

/**
 * The typos a word costs against a query word allowed `allowed` typos, or -1 when it does not match.
 * A typo on the first letter counts as two.
 */
export function typoCost(query: string, word: string, allowed: number, asPrefix: boolean): number {
  if (allowed === 0) return (asPrefix ? word.startsWith(query) : word === query) ? 0 : -1;
  const sameFirst = query.codePointAt(0) === word.codePointAt(0);
  if (sameFirst) {
    const d = editDistance(query, word, allowed, asPrefix);
    return d <= allowed ? d : -1;
  }
  if (allowed < 2) return -1;
  return editDistance(query, word, 1, asPrefix) <= 1 ? 2 : -1;
}
