import { recordValue } from '../../lib/contracts/records';
import type { OwnRecord } from '../../lib/contracts/submissions';
import type { Vocabulary } from '../../lib/contracts/vocabulary';
import { formatValue } from './format';
import RecordEditor from './RecordEditor';
import { columnHeading, depthRange, storedName, TABLE_FIELDS } from './record-fields';
import StatusTag from './StatusTag';

interface OwnRecordsTableProps {
  submissionId: string;
  records: OwnRecord[];
  /** records can be corrected (the submission is returned and the person may upload) */
  editable: boolean;
  editing: string | null;
  savedIds: ReadonlySet<string>;
  vocabulary: Vocabulary | null;
  onEdit(recordId: string | null): void;
  onSaved(recordId: string): Promise<void>;
}

/** Every record of the submission in full; returned ones highlighted, the steward's comment beside the row. */
export default function OwnRecordsTable(props: OwnRecordsTableProps) {
  const { records, editable, editing } = props;
  const withComments = editable || records.some((r) => r.reviewComment);
  const columnCount = 6 + TABLE_FIELDS.length + (withComments ? 1 : 0);
  return (
    <div className="relative overflow-x-auto">
      <table
        className="data-table [&_td:first-child]:pl-4 [&_th:first-child]:pl-4 [&_th]:align-bottom"
        data-testid="records-table"
      >
        <thead>
          <tr>
            <th scope="col">Row</th>
            <th scope="col">State</th>
            {withComments && (
              <th scope="col" className="min-w-[15rem]">
                Steward's comment
              </th>
            )}
            <th scope="col">Borehole</th>
            <th scope="col">Sample</th>
            <th scope="col">Geological unit · cell</th>
            <th scope="col" className="whitespace-nowrap text-right">
              Depth (m)
            </th>
            {TABLE_FIELDS.map((field) => (
              <th key={field} scope="col" className="min-w-[3rem] text-right">
                {columnHeading(field)}
              </th>
            ))}
          </tr>
        </thead>
        {records.map((record) => {
          const returned = record.status === 'returned';
          const open = editing === record.id;
          return (
            <tbody
              key={record.id}
              className={returned ? 'bg-caution-50' : ''}
              data-testid="record-row"
              data-record-id={record.id}
              data-status={record.status}
            >
              <tr className={returned ? '[&>td:first-child]:border-l-4 [&>td:first-child]:border-l-caution-500' : ''}>
                <td className="text-xs font-semibold">{record.rowNumber ?? '—'}</td>
                <td>
                  <StatusTag status={record.status} testId="record-status" />
                  {props.savedIds.has(record.id) && <p className="mt-0.5 text-2xs text-tide-700">corrected</p>}
                </td>
                {withComments && (
                  <td className="text-xs">
                    {record.reviewComment && (
                      <p className={returned ? 'font-medium text-caution-900' : 'text-ink-600'} data-testid="record-comment">
                        {record.reviewComment}
                      </p>
                    )}
                    {editable && returned && (
                      <button
                        type="button"
                        className="btn-quiet mt-1 whitespace-nowrap px-2 py-0.5 text-xs"
                        onClick={() => props.onEdit(open ? null : record.id)}
                        aria-expanded={open}
                        data-testid="correct-record"
                      >
                        {open ? 'Close the correction' : 'Correct this record'}
                      </button>
                    )}
                  </td>
                )}
                <td className="whitespace-nowrap">{formatValue(record.boreholeId)}</td>
                <td className="whitespace-nowrap">{formatValue(record.sampleId)}</td>
                <td className="min-w-[9rem] text-xs">
                  <div className="text-ink-800">{formatValue(record.geologicalUnit)}</div>
                  <div className="text-ink-500">{formatValue(record.locationCell)}</div>
                </td>
                <td className="whitespace-nowrap text-right">{depthRange(record.depthTopM, record.depthBottomM, formatValue)}</td>
                {TABLE_FIELDS.map((field) => (
                  <td key={field} className="text-right" data-field={field}>
                    {formatValue(recordValue(record, storedName(field)))}
                  </td>
                ))}
              </tr>
              {open && (
                <tr>
                  <td colSpan={columnCount} className="p-0">
                    <div className="sticky left-0 max-w-[calc(min(100vw,80rem)-2.5rem)]">
                      <RecordEditor
                        submissionId={props.submissionId}
                        record={record}
                        vocabulary={props.vocabulary}
                        onSaved={() => props.onSaved(record.id)}
                        onClose={() => props.onEdit(null)}
                      />
                    </div>
                  </td>
                </tr>
              )}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
