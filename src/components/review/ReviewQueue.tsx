import { useEffect, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { ReviewQueueList } from '../../lib/contracts/review';
import FormMessage from '../account/FormMessage';
import { getJson } from '../account/post-json';
import { formatDateTime, plural } from '../contribute/format';
import StatusTag from '../contribute/StatusTag';
import { sourceKindLabel } from '../contribute/status-labels';
import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import { LONG_WAIT_DAYS, waitingText } from './waiting';

type QueueState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; data: Json<ReviewQueueList> };

/** Submissions waiting for a steward, oldest first, with their size, import flags and how long they have waited. */
export default function ReviewQueue() {
  const [state, setState] = useState<QueueState>({ kind: 'loading' });

  useEffect(() => {
    void getJson<Json<ReviewQueueList>>('/api/review').then((result) =>
      setState(result.ok ? { kind: 'loaded', data: result.data } : { kind: 'failed', message: result.failure.message }),
    );
  }, []);

  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading the queue…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;
  const { totals, submissions } = state.data;
  return (
    <section className="panel" aria-labelledby="queue-heading" data-testid="review-queue">
      <div className="flex flex-wrap items-baseline gap-x-4 border-b border-ink-200 px-4 py-2">
        <h2 id="queue-heading">Waiting for review</h2>
        <p className="text-sm text-ink-600" data-testid="queue-totals">
          {plural(totals.submissions, 'submission')} · {plural(totals.records, 'test record')}
        </p>
      </div>
      {submissions.length === 0 ? (
        <p className="px-4 py-3 text-sm text-ink-600" data-testid="queue-empty">
          Nothing is waiting. New submissions appear here, and every steward gets an e-mail.
        </p>
      ) : (
        <div className="relative overflow-x-auto">
          <table className={PANEL_TABLE_CLASS}>
            <thead>
              <tr>
                <th scope="col">Waiting</th>
                <th scope="col">Firm</th>
                <th scope="col">File</th>
                <th scope="col">Kind</th>
                <th scope="col" className="text-right">
                  Test records
                </th>
                <th scope="col" className="text-right">
                  With import flags
                </th>
                <th scope="col">Submitted</th>
                <th scope="col">State</th>
                <th scope="col">
                  <span className="sr-only">Open</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {submissions.map((s) => (
                <tr key={s.id} data-testid="queue-row" data-submission-id={s.id}>
                  <td className={`whitespace-nowrap ${s.waitingDays >= LONG_WAIT_DAYS ? 'font-semibold text-caution-700' : ''}`}>
                    {waitingText(s.waitingDays)}
                  </td>
                  <td className="font-medium">{s.firm}</td>
                  <td className="max-w-[16rem] truncate" title={s.fileName ?? undefined}>
                    {s.fileName ?? '—'}
                  </td>
                  <td>{sourceKindLabel(s.sourceKind)}</td>
                  <td className="text-right">{s.rowCount.toLocaleString('en-GB')}</td>
                  <td className={`text-right ${s.flaggedRows > 0 ? 'text-caution-700' : 'text-ink-400'}`}>{s.flaggedRows}</td>
                  <td className="whitespace-nowrap">{formatDateTime(s.submittedAt)}</td>
                  <td>
                    <StatusTag status={s.status} />
                  </td>
                  <td>
                    <a href={`/review/${s.id}`} className="btn-quiet px-2 py-0.5 text-xs" data-testid="open-review">
                      Review
                    </a>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
