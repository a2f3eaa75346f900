import { type SyntheticEvent, useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { FirmEntry } from '../../lib/contracts/people';
import { FIRM_ROLE_LABELS } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { postJson } from '../account/post-json';

interface OwnershipControlProps {
  firm: Json<FirmEntry>;
  onPassed(message: string): Promise<void>;
}

/** Passes a firm to another of its members; the current owner becomes a firm admin. */
export default function OwnershipControl({ firm, onPassed }: OwnershipControlProps) {
  const [open, setOpen] = useState(false);
  const [memberId, setMemberId] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const candidates = firm.members.filter((m) => m.role !== 'owner');
  const owners = firm.members.filter((m) => m.role === 'owner').map((m) => m.name);
  const chosen = candidates.find((m) => m.memberId === memberId);

  if (candidates.length === 0) return <span className="text-xs text-ink-500">No other member to pass it to</span>;
  if (!open) {
    return (
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setOpen(true)} data-testid="ownership-open">
        Pass ownership…
      </button>
    );
  }

  async function pass(event: SyntheticEvent) {
    event.preventDefault();
    if (!chosen) {
      setProblem('Choose the member who becomes owner.');
      return;
    }
    setBusy(true);
    setProblem(null);
    const result = await postJson(`/api/admin/firms/${firm.id}/ownership`, { newOwnerMemberId: memberId });
    setBusy(false);
    if (!result.ok) {
      setProblem(result.failure.message);
      return;
    }
    setOpen(false);
    await onPassed(
      `${chosen.name} now owns ${firm.name}${owners.length ? `; ${owners.join(' and ')} stays as firm admin` : ''}. Both have been told by e-mail.`,
    );
  }

  return (
    <form onSubmit={pass} className="w-72 space-y-1.5" data-testid="ownership-form">
      <label htmlFor={`owner-${firm.id}`} className="field-label">
        New owner of {firm.name}
      </label>
      <select
        id={`owner-${firm.id}`}
        className="field-input"
        value={memberId}
        onChange={(e) => setMemberId(e.target.value)}
        data-testid="ownership-member"
      >
        <option value="">Choose a member…</option>
        {candidates.map((m) => (
          <option key={m.memberId} value={m.memberId}>
            {m.name} ({FIRM_ROLE_LABELS[m.role]})
          </option>
        ))}
      </select>
      <p className="text-xs text-ink-500">
        {owners.length ? `${owners.join(' and ')} becomes a firm admin.` : 'The firm has no owner now.'}
      </p>
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      <span className="flex gap-1.5">
        <button type="submit" className="btn-primary px-2 py-0.5 text-xs" disabled={busy} data-testid="ownership-confirm">
          Pass ownership
        </button>
        <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </span>
    </form>
  );
}
