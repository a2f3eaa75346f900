import { type SyntheticEvent, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { PersonEntry } from '../../lib/contracts/people';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';

interface SuspendControlProps {
  person: Json<PersonEntry>;
  isSelf: boolean;
  onChanged(message: string): Promise<void>;
}

/** Suspends a person with a reason they will be told, or lifts the suspension. */
export default function SuspendControl({ person, isSelf, onChanged }: SuspendControlProps) {
  const [asking, setAsking] = useState(false);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (isSelf) return <span className="text-xs text-ink-500">You</span>;

  async function send(body: unknown, message: string) {
    setBusy(true);
    setProblem(null);
    const result = await postJson(`/api/admin/people/${person.id}/suspension`, body);
    setBusy(false);
    if (!result.ok) {
      setProblem([result.failure.message, ...result.failure.issues.map((i) => i.message)].join(' '));
      return;
    }
    setAsking(false);
    await onChanged(message);
  }

  function suspend(event: SyntheticEvent) {
    event.preventDefault();
    void send(
      { suspended: true, reason },
      `Suspended ${person.name}: signed out everywhere, and told the reason when signing in.`,
    );
  }

  if (person.suspended) {
    return (
      <button
        type="button"
        className="btn-quiet px-2 py-0.5 text-xs"
        disabled={busy}
        onClick={() => void send({ suspended: false }, `${person.name} can sign in again.`)}
      >
        Lift suspension
      </button>
    );
  }
  if (!asking) {
    return (
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setAsking(true)} data-testid="suspend-open">
        Suspend
      </button>
    );
  }
  return (
    <form onSubmit={suspend} className="w-64 space-y-1.5" data-testid="suspend-form">
      <label htmlFor={`reason-${person.id}`} className="field-label">
        Reason {person.name} will read
      </label>
      <input id={`reason-${person.id}`} className="field-input" value={reason} onChange={(e) => setReason(e.target.value)} />
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      <span className="flex gap-1.5">
        <button type="submit" className="btn border-fault-500 bg-fault-500 px-2 py-0.5 text-xs text-white" disabled={busy}>
          Suspend {person.name}
        </button>
        <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setAsking(false)}>
          Keep
        </button>
      </span>
    </form>
  );
}
