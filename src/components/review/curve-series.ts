import type { Increment } from '../../lib/contracts/review';

type Point = [number, number];
/** A point, or '-' to break the line between two separate stretches of one branch. */
export type SeriesDatum = Point | '-';

/**
 * Splits the readings into a loading and an unloading branch for an e–log σ′ plot. Each stretch starts
 * from the reading before it, so the branches join where loading turns to unloading (and back). Readings
 * without a void ratio or with no stress (which a log axis cannot show) are left out.
 */
export function curveSeries(increments: readonly Increment[]): { loading: SeriesDatum[]; unloading: SeriesDatum[] } {
  const loading: SeriesDatum[] = [];
  const unloading: SeriesDatum[] = [];
  let previous: { point: Point; unloading: boolean } | null = null;
  const ordered = [...increments].sort((a, b) => a.incrementNo - b.incrementNo);
  for (const increment of ordered) {
    if (increment.endVoidRatio === null || !(increment.appliedStressKpa > 0)) continue;
    const point: Point = [increment.appliedStressKpa, increment.endVoidRatio];
    const branch = increment.isUnloading ? unloading : loading;
    if (previous && previous.unloading !== increment.isUnloading) {
      if (branch.length > 0) branch.push('-');
      branch.push(previous.point);
    }
    branch.push(point);
    previous = { point, unloading: increment.isUnloading };
  }
  return { loading, unloading };
}
