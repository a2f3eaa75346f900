import { useEffect, useState } from 'react';
import type { InvitationForRecipient } from '../../lib/contracts/firms';
import type { Json } from '../../lib/contracts/json';
import { FIRM_ROLE_LABELS, isFirmRole } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { getJson, postJson } from '../account/post-json';
import { formatDate } from './format-date';

type Invitation = Json<InvitationForRecipient>['invitation'];

interface InvitationResponseProps {
  invitationId: string;
  signedInEmail: string;
}

type State =
  | { kind: 'loading' }
  | { kind: 'failed'; message: string }
  | { kind: 'open'; invitation: Invitation }
  | { kind: 'declined'; invitation: Invitation };

const STATUS_WORDS: Record<string, string> = {
  accepted: 'was already accepted',
  rejected: 'was declined',
  canceled: 'was withdrawn by the firm',
};

/** The invited person's answer: accept (the firm becomes active) or decline. */
export default function InvitationResponse({ invitationId, signedInEmail }: InvitationResponseProps) {
  const [state, setState] = useState<State>({ kind: 'loading' });
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const path = `/api/invitations/${encodeURIComponent(invitationId)}`;

  useEffect(() => {
    void getJson<Json<InvitationForRecipient>>(path).then((result) =>
      setState(
        result.ok ? { kind: 'open', invitation: result.data.invitation } : { kind: 'failed', message: result.failure.message },
      ),
    );
  }, [path]);

  async function answer(choice: 'accept' | 'reject', invitation: Invitation) {
    setBusy(true);
    setProblem(null);
    const result = await postJson(`${path}/${choice}`);
    if (!result.ok) {
      setBusy(false);
      setProblem(result.failure.message);
      return;
    }
    if (choice === 'accept') window.location.assign('/firm');
    else setState({ kind: 'declined', invitation });
  }

  if (state.kind === 'loading') return <p className="text-sm text-ink-500">Loading the invitation…</p>;
  if (state.kind === 'failed') return <FormMessage kind="error">{state.message}</FormMessage>;

  const { invitation } = state;
  const roleLabel = isFirmRole(invitation.role) ? FIRM_ROLE_LABELS[invitation.role] : invitation.role;
  if (state.kind === 'declined') {
    return (
      <div className="panel max-w-xl space-y-3 p-5">
        <FormMessage kind="success">You declined the invitation to {invitation.firmName}.</FormMessage>
        <a href="/welcome">Back to the start page</a>
      </div>
    );
  }

  const isForSomeoneElse = invitation.email.toLowerCase() !== signedInEmail.toLowerCase();
  const hasExpired = invitation.status === 'pending' && new Date(invitation.expiresAt).getTime() < Date.now();
  const isOpen = invitation.status === 'pending' && !hasExpired;
  return (
    <div className="panel max-w-xl space-y-4 p-5" data-testid="invitation">
      <div>
        <h2 data-testid="invitation-firm">{invitation.firmName}</h2>
        <p className="mt-1 text-sm text-ink-700">
          invites <strong>{invitation.email}</strong> to join as <strong data-testid="invitation-role">{roleLabel}</strong>.
        </p>
        {isOpen && <p className="mt-1 text-xs text-ink-500">Open until {formatDate(invitation.expiresAt)}.</p>}
      </div>
      {!isOpen && (
        <FormMessage kind="error">
          This invitation{' '}
          {hasExpired
            ? 'has expired; ask the firm for a new one'
            : (STATUS_WORDS[invitation.status] ?? `is ${invitation.status}`)}
          .
        </FormMessage>
      )}
      {isOpen && isForSomeoneElse && (
        <FormMessage kind="error">
          You are signed in as {signedInEmail}. Sign out, then sign in or sign up as {invitation.email} to answer it.
        </FormMessage>
      )}
      {problem && <FormMessage kind="error">{problem}</FormMessage>}
      {isOpen && !isForSomeoneElse && (
        <div className="flex flex-wrap gap-3">
          <button type="button" className="btn-primary" disabled={busy} onClick={() => void answer('accept', invitation)}>
            Join {invitation.firmName}
          </button>
          <button type="button" className="btn-quiet" disabled={busy} onClick={() => void answer('reject', invitation)}>
            Decline
          </button>
        </div>
      )}
    </div>
  );
}
