import { useCallback, useEffect, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { DecisionResult, ReviewDetail } from '../../lib/contracts/review';
import FormMessage from '../account/FormMessage';
import { getJson } from '../account/post-json';
import { plural } from '../contribute/format';
import SubmissionHistory from '../contribute/SubmissionHistory';
import DecisionForm from './DecisionForm';
import ReviewRecordsTable from './ReviewRecordsTable';
import ReviewSummary from './ReviewSummary';

type DetailState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; data: Json<ReviewDetail> };

const DECIDABLE = new Set(['submitted', 'in_review']);

function toggled(set: ReadonlySet<string>, id: string): Set<string> {
  const next = new Set(set);
  if (next.has(id)) next.delete(id);
  else next.add(id);
  return next;
}

function decisionText(result: DecisionResult['submission']): string {
  if (result.status === 'accepted')
    return `Accepted: ${plural(result.published, 'record')} published in bank version ${result.bankVersion}. The firm has been told.`;
  if (result.status === 'returned')
    return `Returned to the firm${result.returnedRecords ? ` with comments on ${plural(result.returnedRecords, 'record')}` : ''}.`;
  return 'Rejected. The firm has been told why.';
}

/** One submission for the steward: shared values against the pool, raw readings, and the decision. */
export default function ReviewSubmission({ submissionId }: { submissionId: string }) {
  const [state, setState] = useState<DetailState>({ kind: 'loading' });
  const [comments, setComments] = useState<Record<string, string>>({});
  const [openCurves, setOpenCurves] = useState<Set<string>>(new Set());
  const [openComments, setOpenComments] = useState<Set<string>>(new Set());
  const [decided, setDecided] = useState<string | null>(null);

  const load = useCallback(async () => {
    const result = await getJson<Json<ReviewDetail>>(`/api/review/${encodeURIComponent(submissionId)}`);
    setState(result.ok ? { kind: 'loaded', data: result.data } : { kind: 'failed', message: result.failure.message });
  }, [submissionId]);

  useEffect(() => {
    void load();
  }, [load]);

  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading the submission…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;

  const { submission, records, history } = state.data;
  const decidable = DECIDABLE.has(submission.status);
  const recordComments = records
    .filter((r) => r.status === 'pending' && comments[r.id]?.trim())
    .map((r) => ({ recordId: r.id, comment: (comments[r.id] ?? '').trim() }));
  const withReadings = records.filter((r) => r.increments.length > 0).length;
  const pool = Math.max(0, ...records.flatMap((r) => Object.values(r.comparison).map((c) => c?.poolSize ?? 0)));

  return (
    <div className="space-y-5" data-testid="review-submission" data-status={submission.status}>
      <ReviewSummary submission={submission} records={records} />
      {decided && (
        <FormMessage kind="success" testId="decision-done">
          {decided}
        </FormMessage>
      )}
      <section className="panel" aria-labelledby="review-records-heading">
        <div className="border-b border-ink-200 px-4 py-2">
          <h2 id="review-records-heading">Test records</h2>
          <p className="text-xs text-ink-500">
            Shared values only; the firm's private details are never shown here. P = percentile among the published records of the
            same geological unit ({pool > 0 ? `up to ${plural(pool, 'record')}` : 'none published yet'}); a red badge marks a
            value far outside them (beyond 3 × the interquartile range). {withReadings} of {records.length} records carry raw
            readings.
          </p>
        </div>
        <ReviewRecordsTable
          records={records}
          commentable={decidable}
          comments={comments}
          openCurves={openCurves}
          openComments={openComments}
          onToggleCurve={(id) => setOpenCurves((current) => toggled(current, id))}
          onToggleComment={(id) => setOpenComments((current) => toggled(current, id))}
          onComment={(id, text) => setComments((current) => ({ ...current, [id]: text }))}
        />
      </section>
      {decidable && (
        <DecisionForm
          submissionId={submissionId}
          pendingCount={records.filter((r) => r.status === 'pending').length}
          recordComments={recordComments}
          onDecided={async (result) => {
            setDecided(decisionText(result));
            setComments({});
            setOpenComments(new Set());
            await load();
          }}
        />
      )}
      {!decidable && !decided && (
        <p className="text-sm text-ink-600" data-testid="not-decidable">
          This submission is not waiting for a decision. <a href="/review">Back to the queue</a>
        </p>
      )}
      <SubmissionHistory history={history} />
    </div>
  );
}
