import { recordValue } from '../../lib/contracts/records';
import type { ReviewRecord } from '../../lib/contracts/review';
import { formatValue } from '../contribute/format';
import ComparisonBadge from './ComparisonBadge';

interface ReviewValueCellProps {
  record: ReviewRecord;
  /** the record's value name, e.g. "compressionIndex", "cvNcM2PerYear" */
  name: string;
}

/** A value with, where the bank compares it, its percentile badge; far-out values are tinted. */
export default function ReviewValueCell({ record, name }: ReviewValueCellProps) {
  const outlier = record.outliers.includes(name);
  return (
    <td className={`whitespace-nowrap text-right ${outlier ? 'bg-fault-50' : ''}`} data-value={name}>
      <div>{formatValue(recordValue(record, name))}</div>
      {name in record.comparison && (
        <div className="mt-0.5">
          <ComparisonBadge comparison={record.comparison[name]} />
        </div>
      )}
    </td>
  );
}
