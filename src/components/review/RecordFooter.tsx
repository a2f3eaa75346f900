import { lazy, Suspense } from 'react';
import type { ReviewRecord } from '../../lib/contracts/review';
import { FIELD_BY_KEY } from '../../lib/import';

const ELogSigmaChart = lazy(() => import('./ELogSigmaChart'));

interface RecordFooterProps {
  record: ReviewRecord;
  columnCount: number;
  canComment: boolean;
  comment: string;
  curveOpen: boolean;
  commentOpen: boolean;
  onToggleCurve(): void;
  onToggleComment(): void;
  onComment(text: string): void;
}

/** Under a record's values: raw readings (the e–log σ′ curve, opened on demand), import flags, and the comment to the firm. */
export default function RecordFooter(props: RecordFooterProps) {
  const { record, canComment, comment, curveOpen, commentOpen } = props;
  const label = `row ${record.rowNumber ?? '?'}`;
  const commentId = `record-comment-${record.id}`;
  const flags = record.importFlags ?? [];
  return (
    <tr>
      <td colSpan={props.columnCount} className="pt-0 pb-2">
        <div className="sticky left-4 max-w-[calc(min(100vw,80rem)-4rem)] space-y-2">
          <div className="flex flex-wrap items-start gap-x-6 gap-y-1 text-xs">
            <div data-testid="readings-cell">
              <span className="mr-1.5 text-ink-500">Raw readings:</span>
              {record.increments.length > 0 ? (
                <button
                  type="button"
                  className="btn-quiet px-2 py-0.5 text-xs"
                  aria-expanded={curveOpen}
                  onClick={props.onToggleCurve}
                  data-testid="toggle-curve"
                >
                  {curveOpen ? 'Hide the e–log σ′ curve' : `Show the e–log σ′ curve (${record.increments.length} steps)`}
                </button>
              ) : (
                <span className="text-ink-600" data-testid="no-readings">
                  none with this record; recomputation from raw readings comes later.
                </span>
              )}
            </div>
            <div data-testid="import-flags">
              <span className="mr-1.5 text-ink-500">Import flags:</span>
              {flags.length === 0 ? (
                <span className="text-ink-600">none</span>
              ) : (
                flags.map((flag) => (
                  <span key={`${flag.field}-${flag.reason}`} className="mr-2 text-caution-700">
                    <span className="font-medium">{FIELD_BY_KEY.get(flag.field)?.label ?? flag.field}:</span> {flag.reason}
                  </span>
                ))
              )}
            </div>
            {record.reviewComment && (
              <div className="text-ink-600">
                <span className="mr-1.5 text-ink-500">Earlier comment:</span>“{record.reviewComment}”
              </div>
            )}
            {canComment && (
              <div className="flex items-start gap-2">
                {comment.trim() && !commentOpen && <span className="text-caution-900">Your comment: “{comment.trim()}”</span>}
                <button
                  type="button"
                  className="btn-quiet px-2 py-0.5 text-xs"
                  aria-expanded={commentOpen}
                  onClick={props.onToggleComment}
                  data-testid="toggle-comment"
                >
                  {commentOpen ? 'Done' : comment.trim() ? 'Edit the comment' : 'Comment on this record'}
                </button>
              </div>
            )}
          </div>
          {canComment && commentOpen && (
            <div className="max-w-2xl">
              <label htmlFor={commentId} className="field-label">
                Comment on {label} (sent to the firm if you return the submission)
              </label>
              <textarea
                id={commentId}
                className="field-input"
                rows={2}
                maxLength={2000}
                value={comment}
                onChange={(event) => props.onComment(event.target.value)}
                placeholder="What should the firm check or correct in this test record?"
                data-testid="record-comment-input"
              />
            </div>
          )}
          {curveOpen && (
            <Suspense fallback={<p className="text-sm text-ink-500">Drawing the curve…</p>}>
              <ELogSigmaChart increments={record.increments} label={label} />
            </Suspense>
          )}
        </div>
      </td>
    </tr>
  );
}
