import { useState } from 'react';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';
import ConfirmButton from './ConfirmButton';

interface LeaveFirmPanelProps {
  firmName: string;
  isOwner: boolean;
}

/** Leaving the active firm; the owner cannot leave, so they are told why instead. */
export default function LeaveFirmPanel({ firmName, isOwner }: LeaveFirmPanelProps) {
  const [problem, setProblem] = useState<string | null>(null);

  async function leave() {
    setProblem(null);
    const result = await postJson('/api/firm/leave');
    if (result.ok) window.location.assign('/welcome');
    else setProblem(result.failure.message);
  }

  return (
    <section className="panel px-4 py-3" aria-labelledby="leave-heading" data-testid="leave-firm-panel">
      <h2 id="leave-heading">Leave {firmName}</h2>
      {isOwner ? (
        <p className="mt-1 text-sm text-ink-600">
          You own this firm, so you cannot leave it. Ask the platform admin to pass ownership to another member first.
        </p>
      ) : (
        <>
          <p className="mt-1 text-sm text-ink-600">
            You lose access to the firm's private records and estimates. Records you contributed stay with the firm.
          </p>
          {problem && (
            <div className="mt-2">
              <FormMessage kind="error">{problem}</FormMessage>
            </div>
          )}
          <div className="mt-3">
            <ConfirmButton label="Leave the firm" confirmLabel={`Leave ${firmName}`} onConfirm={leave} testId="leave-firm" />
          </div>
        </>
      )}
    </section>
  );
}
