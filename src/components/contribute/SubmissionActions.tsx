import { useState } from 'react';
import ConfirmButton from '../firm/ConfirmButton';
import { plural } from './format';

interface SubmissionActionsProps {
  status: string;
  returnedCount: number;
  correctedCount: number;
  onResubmit(): Promise<void>;
  onWithdraw(): Promise<void>;
}

const WITHDRAWABLE = new Set(['draft', 'submitted', 'in_review', 'returned']);

/** Send a returned submission back, or withdraw one that is not decided yet. */
export default function SubmissionActions({
  status,
  returnedCount,
  correctedCount,
  onResubmit,
  onWithdraw,
}: SubmissionActionsProps) {
  const [busy, setBusy] = useState(false);
  if (!WITHDRAWABLE.has(status)) return null;
  return (
    <section className="panel flex flex-wrap items-center gap-3 p-4" data-testid="submission-actions">
      {status === 'returned' && (
        <>
          <p className="flex-1 text-sm text-ink-700">
            {plural(returnedCount, 'record')} came back with comments
            {correctedCount > 0 ? `; you corrected ${correctedCount} so far` : ''}. Correct them below, then send the submission
            back for review.
          </p>
          <button
            type="button"
            className="btn-primary"
            disabled={busy}
            data-testid="resubmit"
            onClick={async () => {
              setBusy(true);
              await onResubmit();
              setBusy(false);
            }}
          >
            {busy ? 'Sending…' : 'Send back for review'}
          </button>
        </>
      )}
      {status !== 'returned' && (
        <p className="flex-1 text-sm text-ink-600">Waiting for a data steward. You can withdraw it until it is decided.</p>
      )}
      <ConfirmButton label="Withdraw" confirmLabel="Withdraw this submission" onConfirm={onWithdraw} testId="withdraw" />
    </section>
  );
}
