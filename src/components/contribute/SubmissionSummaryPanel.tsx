import type { Json } from '../../lib/contracts/json';
import type { OwnRecord, OwnSubmission } from '../../lib/contracts/submissions';
import { formatDateTime } from './format';
import StatusTag from './StatusTag';
import { sourceKindLabel, statusLabel } from './status-labels';

interface SubmissionSummaryPanelProps {
  submission: Json<OwnSubmission>['submission'];
  records: OwnRecord[];
}

const WAITING = new Set(['submitted', 'in_review']);

/** The submission's file, state and dates, and the steward's comment on the whole submission. */
export default function SubmissionSummaryPanel({ submission, records }: SubmissionSummaryPanelProps) {
  const waitingAgain = WAITING.has(submission.status) && submission.decidedAt !== null;
  const counts = new Map<string, number>();
  for (const r of records) counts.set(r.status, (counts.get(r.status) ?? 0) + 1);
  const versions = [...new Set(records.map((r) => r.bankVersion).filter((v) => typeof v === 'number'))];
  return (
    <section className="panel p-4" data-testid="submission-summary">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="break-all">{submission.fileName ?? 'Untitled upload'}</h2>
        <StatusTag status={submission.status} testId="submission-state" />
      </div>
      <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="field-label">Kind</dt>
          <dd>{sourceKindLabel(submission.sourceKind)}</dd>
        </div>
        <div>
          <dt className="field-label">Submitted</dt>
          <dd>{formatDateTime(submission.submittedAt)}</dd>
        </div>
        <div>
          <dt className="field-label">{waitingAgain ? 'Last decided' : 'Decided'}</dt>
          <dd>{formatDateTime(submission.decidedAt)}</dd>
        </div>
        <div>
          <dt className="field-label">Test records</dt>
          <dd data-testid="record-counts">
            {[...counts.entries()].map(([status, n]) => `${n} ${statusLabel(status).toLowerCase()}`).join(', ') || '0'}
            {versions.length > 0 && ` in bank version ${versions.join(', ')}`}
          </dd>
        </div>
      </dl>
      {submission.stewardComment && (
        <div className="mt-3 rounded border border-caution-300 bg-caution-50 px-3 py-2 text-sm" data-testid="steward-comment">
          <p className="field-label text-caution-700">
            {waitingAgain ? 'The steward wrote when returning it' : 'The steward wrote'}
          </p>
          <p className="mt-0.5 text-ink-800">{submission.stewardComment}</p>
        </div>
      )}
    </section>
  );
}
