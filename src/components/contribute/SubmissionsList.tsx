import { useCallback, useEffect, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { SubmissionList, SubmissionSummary } from '../../lib/contracts/submissions';
import FormMessage from '../account/FormMessage';
import { getJson } from '../account/post-json';
import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import { SUBMISSIONS_CHANGED } from './events';
import { formatDateTime } from './format';
import StatusTag from './StatusTag';
import { sourceKindLabel } from './status-labels';

type ListState =
  | { kind: 'loading' }
  | { kind: 'failed'; message: string }
  | { kind: 'loaded'; submissions: Json<SubmissionSummary>[] };

/** The firm's submissions, newest first, with their review state and the steward's comment. */
export default function SubmissionsList() {
  const [state, setState] = useState<ListState>({ kind: 'loading' });

  const load = useCallback(async () => {
    const result = await getJson<Json<SubmissionList>>('/api/submissions');
    setState(
      result.ok ? { kind: 'loaded', submissions: result.data.submissions } : { kind: 'failed', message: result.failure.message },
    );
  }, []);

  useEffect(() => {
    void load();
    const reload = () => void load();
    window.addEventListener(SUBMISSIONS_CHANGED, reload);
    return () => window.removeEventListener(SUBMISSIONS_CHANGED, reload);
  }, [load]);

  return (
    <section className="panel" aria-labelledby="submissions-heading" data-testid="submissions-list">
      <div className="border-b border-ink-200 px-4 py-2">
        <h2 id="submissions-heading">Your firm's submissions</h2>
        <p className="text-xs text-ink-500">Open one to see each test record, the steward's comments and its history.</p>
      </div>
      {state.kind === 'loading' && <p className="px-4 py-3 text-sm text-ink-500">Loading submissions…</p>}
      {state.kind === 'failed' && (
        <div className="p-4">
          <FormMessage kind="error">{state.message}</FormMessage>
        </div>
      )}
      {state.kind === 'loaded' && state.submissions.length === 0 && (
        <p className="px-4 py-3 text-sm text-ink-600" data-testid="no-submissions">
          Your firm has not submitted anything yet.
        </p>
      )}
      {state.kind === 'loaded' && state.submissions.length > 0 && (
        <div className="relative overflow-x-auto">
          <table className={PANEL_TABLE_CLASS}>
            <thead>
              <tr>
                <th scope="col">File</th>
                <th scope="col">Kind</th>
                <th scope="col" className="text-right">
                  Test records
                </th>
                <th scope="col">Submitted</th>
                <th scope="col">State</th>
                <th scope="col">Decided</th>
                <th scope="col">Steward's comment</th>
              </tr>
            </thead>
            <tbody>
              {state.submissions.map((s) => (
                <tr key={s.id} data-testid="submission-row" data-submission-id={s.id}>
                  <td className="font-medium">
                    <a href={`/contribute/submissions/${s.id}`}>{s.fileName ?? 'Untitled upload'}</a>
                  </td>
                  <td>{sourceKindLabel(s.sourceKind)}</td>
                  <td className="text-right">{s.rowCount.toLocaleString('en-GB')}</td>
                  <td className="whitespace-nowrap">{formatDateTime(s.submittedAt)}</td>
                  <td>
                    <StatusTag status={s.status} testId="submission-status" />
                  </td>
                  <td className="whitespace-nowrap">{formatDateTime(s.decidedAt)}</td>
                  <td className="max-w-xs text-xs text-ink-700">{s.stewardComment ?? ''}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
