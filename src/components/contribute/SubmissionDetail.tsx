import { useCallback, useEffect, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { OwnSubmission } from '../../lib/contracts/submissions';
import type { Vocabulary } from '../../lib/contracts/vocabulary';
import FormMessage from '../account/FormMessage';
import { getJson, postJson } from '../account/post-json';
import { plural } from './format';
import OwnRecordsTable from './OwnRecordsTable';
import SubmissionActions from './SubmissionActions';
import SubmissionHistory from './SubmissionHistory';
import SubmissionSummaryPanel from './SubmissionSummaryPanel';

interface SubmissionDetailProps {
  submissionId: string;
  /** the person may correct, send back and withdraw (submission:create) */
  canChange: boolean;
}

type DetailState = { kind: 'loading' } | { kind: 'failed'; message: string } | { kind: 'loaded'; data: Json<OwnSubmission> };

/** One of the firm's submissions: its state, the steward's comments, every record (correctable when returned), history. */
export default function SubmissionDetail({ submissionId, canChange }: SubmissionDetailProps) {
  const [state, setState] = useState<DetailState>({ kind: 'loading' });
  const [editing, setEditing] = useState<string | null>(null);
  const [savedIds, setSavedIds] = useState<Set<string>>(new Set());
  const [vocabulary, setVocabulary] = useState<Vocabulary | null>(null);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);

  const load = useCallback(async () => {
    const result = await getJson<Json<OwnSubmission>>(`/api/submissions/${encodeURIComponent(submissionId)}`);
    setState(result.ok ? { kind: 'loaded', data: result.data } : { kind: 'failed', message: result.failure.message });
  }, [submissionId]);

  useEffect(() => {
    void load();
  }, [load]);

  const returned = state.kind === 'loaded' && state.data.submission.status === 'returned';
  useEffect(() => {
    if (returned && canChange && !vocabulary)
      void getJson<Vocabulary>('/api/vocabulary').then((r) => r.ok && setVocabulary(r.data));
  }, [returned, canChange, vocabulary]);

  async function act(action: 'resubmit' | 'withdraw') {
    setMessage(null);
    const result = await postJson(`/api/submissions/${encodeURIComponent(submissionId)}/${action}`);
    if (!result.ok) {
      setMessage({ kind: 'error', text: result.failure.message });
      return;
    }
    await load();
    setEditing(null);
    setSavedIds(new Set());
    setMessage({
      kind: 'success',
      text:
        action === 'resubmit'
          ? 'Sent back to the stewards for review.'
          : 'The submission is withdrawn; its records leave the queue.',
    });
  }

  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading the submission…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;

  const { submission, records, history } = state.data;
  const returnedCount = records.filter((r) => r.status === 'returned').length;
  return (
    <div className="space-y-5" data-testid="submission-detail" data-status={submission.status}>
      <SubmissionSummaryPanel submission={submission} records={records} />
      {message && <FormMessage kind={message.kind}>{message.text}</FormMessage>}
      {canChange && (
        <SubmissionActions
          status={submission.status}
          returnedCount={returnedCount}
          correctedCount={savedIds.size}
          onResubmit={() => act('resubmit')}
          onWithdraw={() => act('withdraw')}
        />
      )}
      <section className="panel" aria-labelledby="records-heading">
        <div className="border-b border-ink-200 px-4 py-2">
          <h2 id="records-heading">Test records</h2>
          <p className="text-xs text-ink-500">
            {plural(records.length, 'record')}, in the bank's units, with your firm's private details.
            {returnedCount > 0 && ` ${plural(returnedCount, 'record')} returned: the steward's comment is beside each.`}
          </p>
        </div>
        <OwnRecordsTable
          submissionId={submissionId}
          records={records}
          editable={canChange && submission.status === 'returned'}
          editing={editing}
          savedIds={savedIds}
          vocabulary={vocabulary}
          onEdit={setEditing}
          onSaved={async (recordId) => {
            await load();
            setSavedIds((current) => new Set(current).add(recordId));
            setEditing(null);
            setMessage({
              kind: 'success',
              text: 'Correction saved. Send the submission back when every returned record is corrected.',
            });
          }}
        />
      </section>
      <SubmissionHistory history={history} />
    </div>
  );
}
