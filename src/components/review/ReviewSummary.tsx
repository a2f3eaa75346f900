import type { Json } from '../../lib/contracts/json';
import type { ReviewDetail } from '../../lib/contracts/review';
import { formatDateTime, plural } from '../contribute/format';
import StatusTag from '../contribute/StatusTag';
import { sourceKindLabel } from '../contribute/status-labels';

/** Who submitted what and when, the state, and how many records carry flags. */
export default function ReviewSummary({ submission, records }: Pick<Json<ReviewDetail>, 'submission' | 'records'>) {
  const flagged = records.filter((r) => (r.importFlags ?? []).length > 0).length;
  const outlying = records.filter((r) => r.outliers.length > 0).length;
  return (
    <section className="panel p-4" data-testid="review-summary">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="break-all">{submission.fileName ?? 'Untitled upload'}</h2>
        <StatusTag status={submission.status} testId="review-state" />
      </div>
      <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-5">
        <div>
          <dt className="field-label">Firm</dt>
          <dd>{submission.firm}</dd>
        </div>
        <div>
          <dt className="field-label">Kind</dt>
          <dd>{sourceKindLabel(submission.sourceKind)}</dd>
        </div>
        <div>
          <dt className="field-label">Submitted</dt>
          <dd>{formatDateTime(submission.submittedAt)}</dd>
        </div>
        <div>
          <dt className="field-label">Test records</dt>
          <dd>{submission.rowCount.toLocaleString('en-GB')}</dd>
        </div>
        <div>
          <dt className="field-label">To look at</dt>
          <dd className={flagged || outlying ? 'text-caution-700' : ''}>
            {flagged || outlying
              ? [flagged ? `${plural(flagged, 'record')} flagged` : '', outlying ? `${outlying} with outlying values` : '']
                  .filter(Boolean)
                  .join(', ')
              : 'no flags or outliers'}
          </dd>
        </div>
      </dl>
      {submission.stewardComment && (
        <div className="mt-3 rounded border border-ink-200 bg-ink-50 px-3 py-2 text-sm">
          <p className="field-label">Comment sent with the last decision</p>
          <p className="mt-0.5">{submission.stewardComment}</p>
        </div>
      )}
    </section>
  );
}
