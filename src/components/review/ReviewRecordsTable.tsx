import type { ReviewRecord } from '../../lib/contracts/review';
import { formatValue } from '../contribute/format';
import { columnHeading, depthRange, storedName } from '../contribute/record-fields';
import StatusTag from '../contribute/StatusTag';
import RecordFooter from './RecordFooter';
import ReviewValueCell from './ReviewValueCell';

/** The values a steward reads per record, after the depth range, in this order. */
const REVIEW_FIELDS = [
  'waterContentPct',
  'liquidLimitPct',
  'plasticityIndexPct',
  'initialVoidRatio',
  'compressionIndex',
  'recompressionIndex',
  'preconsolidationStress',
  'verticalEffectiveStress',
  'overconsolidationRatio',
  'cvNc',
  'cvOc',
  'secondaryCompressionIndex',
] as const;

interface ReviewRecordsTableProps {
  records: ReviewRecord[];
  /** the submission can still be decided, so pending records take comments */
  commentable: boolean;
  comments: Readonly<Record<string, string>>;
  openCurves: ReadonlySet<string>;
  openComments: ReadonlySet<string>;
  onToggleCurve(recordId: string): void;
  onToggleComment(recordId: string): void;
  onComment(recordId: string, text: string): void;
}

/**
 * One block per record: its shared values with percentile badges and outlier tints, then a line with its
 * raw readings (a curve to open), import flags and the comment to the firm.
 */
export default function ReviewRecordsTable(props: ReviewRecordsTableProps) {
  const { records, commentable, comments } = props;
  const columnCount = 6 + REVIEW_FIELDS.length;
  return (
    <div className="relative overflow-x-auto">
      <table
        className="data-table [&_td:first-child]:pl-4 [&_th:first-child]:pl-4 [&_th]:align-bottom"
        data-testid="review-records"
      >
        <thead>
          <tr>
            <th scope="col">Row</th>
            <th scope="col">State</th>
            <th scope="col">Geological unit · region · cell</th>
            <th scope="col">{columnHeading('uscsSymbol')}</th>
            <th scope="col" className="whitespace-nowrap text-right">
              Depth (m)
            </th>
            {REVIEW_FIELDS.map((field) => (
              <th key={field} scope="col" className="min-w-[3rem] text-right">
                {columnHeading(field)}
              </th>
            ))}
            <th scope="col">Quality</th>
          </tr>
        </thead>
        {records.map((record) => (
          <tbody
            key={record.id}
            className={`border-b-2 border-ink-200 ${(comments[record.id] ?? '').trim() ? 'bg-caution-50' : ''}`}
            data-testid="review-record"
            data-record-id={record.id}
            data-row={record.rowNumber ?? ''}
          >
            <tr className="[&>td]:border-b-0">
              <td className="text-xs font-semibold">{record.rowNumber ?? '—'}</td>
              <td>
                <StatusTag status={record.status} testId="review-record-status" />
              </td>
              <td className="min-w-[10rem] text-xs">
                <div className="font-medium text-ink-800">{formatValue(record.geologicalUnit)}</div>
                <div className="text-ink-500">
                  {formatValue(record.region)} · {formatValue(record.locationCell)}
                </div>
              </td>
              <td>{formatValue(record.uscsSymbol)}</td>
              <td className="whitespace-nowrap text-right">{depthRange(record.depthTopM, record.depthBottomM, formatValue)}</td>
              {REVIEW_FIELDS.map((field) => (
                <ReviewValueCell key={field} record={record} name={storedName(field)} />
              ))}
              <td className="whitespace-nowrap text-xs" title="Sample quality class from Δe/e0 (1 best, 4 worst)">
                {record.sampleQualityClass ? `class ${record.sampleQualityClass}` : '—'}
              </td>
            </tr>
            <RecordFooter
              record={record}
              columnCount={columnCount}
              canComment={commentable && record.status === 'pending'}
              comment={comments[record.id] ?? ''}
              curveOpen={props.openCurves.has(record.id)}
              commentOpen={props.openComments.has(record.id)}
              onToggleCurve={() => props.onToggleCurve(record.id)}
              onToggleComment={() => props.onToggleComment(record.id)}
              onComment={(text) => props.onComment(record.id, text)}
            />
          </tbody>
        ))}
      </table>
    </div>
  );
}
