import type { PoolComparison } from '../../lib/contracts/review';

function ordinal(n: number): string {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${['th', 'st', 'nd', 'rd'][n % 10] ?? 'th'}`;
}

/** Where a value sits among the published records of its geological unit: percentile, and a flag when far outside. */
export default function ComparisonBadge({ comparison }: { comparison: PoolComparison | null | undefined }) {
  if (!comparison) return null;
  if (comparison.percentile === null || comparison.poolSize === 0) {
    return (
      <span
        className="tag bg-ink-50 font-normal normal-case tracking-normal text-ink-400"
        title="No published records of this geological unit to compare with yet"
        data-testid="comparison-badge"
        data-percentile=""
      >
        no pool
      </span>
    );
  }
  const percentile = Math.round(comparison.percentile);
  const title = `${ordinal(percentile)} percentile of ${comparison.poolSize} published records of the same geological unit${
    comparison.outlier ? `; far ${comparison.outlier === 'high' ? 'above' : 'below'} them (outside 3 × IQR)` : ''
  }`;
  return (
    <span
      className={`tag normal-case tracking-normal ${comparison.outlier ? 'bg-fault-500 text-white' : 'bg-tide-50 font-medium text-tide-800'}`}
      title={title}
      data-testid="comparison-badge"
      data-percentile={percentile}
      data-outlier={comparison.outlier ?? ''}
    >
      P{percentile}
      {comparison.outlier && <span className="ml-1">{comparison.outlier === 'high' ? '▲ high' : '▼ low'}</span>}
      <span className="sr-only">: {title}</span>
    </span>
  );
}
