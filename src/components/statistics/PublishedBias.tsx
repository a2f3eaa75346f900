import type { Json } from '../../lib/contracts/json';
import type { CorrelationPair, PublishedComparison } from '../../lib/statistics';
import { sig } from './axis-display';

/** Each published correlation on the chart: its source, equation, stated validity, caution, and the bank's bias and scatter against it. */
export default function PublishedBias({
  comparisons,
  pair,
}: {
  comparisons: Json<PublishedComparison>[];
  pair: Json<CorrelationPair>;
}) {
  if (comparisons.length === 0) return <p className="mt-2">No published correlation is drawn for this pair.</p>;
  return (
    <div className="mt-3 space-y-2" data-testid="published-bias">
      <p className="font-semibold text-ink-800">Published correlations on this chart</p>
      {comparisons.map(({ correlation, pooled, own }) => (
        <div key={correlation.id} className="border-t border-ink-100 pt-1">
          <p className="font-medium text-ink-800">
            {correlation.source}: {correlation.equation}
          </p>
          <p>Stated for: {correlation.validity.description}</p>
          {pooled.released ? (
            <p>
              Bank against it ({pooled.n} tests, {pooled.firms} firms): observed ÷ predicted median {sig(pooled.medianRatio)},
              mean {sig(pooled.meanRatio)}; scatter (sd of residuals) {sig(pooled.residualSd)}
              {pooled.withinStatedRange !== null && `; ${Math.round(pooled.withinStatedRange * 100)} % within its stated range`}.
            </p>
          ) : (
            <p>Bank's bias withheld: {pooled.reasons.map((r) => r.message).join(' ')}</p>
          )}
          {own && (
            <p>
              Your firm ({own.n} tests): observed ÷ predicted median {sig(own.medianRatio)}.
            </p>
          )}
          <p className="text-ink-500">{correlation.caution}</p>
        </div>
      ))}
      <p className="text-ink-500">Axes of {pair.id}: published lines are drawn only over their stated range of validity.</p>
    </div>
  );
}
