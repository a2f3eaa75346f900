import { type SyntheticEvent, useState } from 'react';
import type { FirmInvitation, SentInvitation } from '../../lib/contracts/firms';
import type { Json } from '../../lib/contracts/json';
import { ASSIGNABLE_FIRM_ROLES, FIRM_ROLE_LABELS } from '../../lib/permissions/roles';
import { inviteMemberSchema } from '../../lib/schemas/firm';
import FormMessage from '../account/FormMessage';
import { postJson, requestJson } from '../account/post-json';
import TextField from '../account/TextField';
import { useSchemaForm } from '../account/use-schema-form';
import ConfirmButton from './ConfirmButton';
import { formatDate } from './format-date';
import { PANEL_TABLE_CLASS } from './panel-table';

interface InvitePanelProps {
  invitations: Json<FirmInvitation>[];
  onChanged(): Promise<void>;
}

/** Invite a colleague by e-mail with a role, and see or withdraw invitations not yet answered. */
export default function InvitePanel({ invitations, onChanged }: InvitePanelProps) {
  const form = useSchemaForm(inviteMemberSchema, { email: '', role: 'engineer' });
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const pending = invitations.filter((invitation) => invitation.status === 'pending');

  async function onSubmit(event: SyntheticEvent) {
    setSentTo(null);
    const created = await form.submit(event, (input) => postJson<Json<SentInvitation>>('/api/firm/invitations', input));
    if (!created) return;
    setSentTo(created.invitation.email);
    form.setValue('email', '');
    await onChanged();
  }

  async function cancel(id: string) {
    setProblem(null);
    const result = await requestJson('DELETE', `/api/firm/invitations/${encodeURIComponent(id)}`);
    if (!result.ok) setProblem(result.failure.message);
    else await onChanged();
  }

  return (
    <section className="panel" aria-labelledby="invite-heading" data-testid="invite-panel">
      <div className="border-b border-ink-200 px-4 py-2">
        <h2 id="invite-heading">Invite a colleague</h2>
        <p className="text-xs text-ink-500">They get an e-mail with a link that works for 7 days, and join once they accept.</p>
      </div>
      <form className="flex flex-wrap items-start gap-3 px-4 py-3" onSubmit={onSubmit} noValidate data-testid="invite-form">
        <TextField
          id="invite-email"
          label="E-mail address"
          type="email"
          className="min-w-64 flex-1"
          value={form.values.email}
          onValueChange={(value) => form.setValue('email', value)}
          error={form.fieldErrors.email}
        />
        <div>
          <label htmlFor="invite-role" className="field-label">
            Role
          </label>
          <select
            id="invite-role"
            className="field-input"
            value={form.values.role}
            onChange={(event) => form.setValue('role', event.target.value)}
            aria-invalid={form.fieldErrors.role ? true : undefined}
            aria-describedby={form.fieldErrors.role ? 'invite-role-error' : undefined}
          >
            {ASSIGNABLE_FIRM_ROLES.map((role) => (
              <option key={role} value={role}>
                {FIRM_ROLE_LABELS[role]}
              </option>
            ))}
          </select>
          {form.fieldErrors.role && (
            <p id="invite-role-error" className="mt-1 text-xs text-fault-700">
              {form.fieldErrors.role}
            </p>
          )}
        </div>
        <button type="submit" className="btn-primary mt-5" disabled={form.busy}>
          {form.busy ? 'Sending…' : 'Send invitation'}
        </button>
      </form>
      <div className="space-y-2 px-4">
        {form.formError && <FormMessage kind="error">{form.formError}</FormMessage>}
        {sentTo && <FormMessage kind="success">Invitation sent to {sentTo}.</FormMessage>}
        {problem && <FormMessage kind="error">{problem}</FormMessage>}
      </div>
      <h3 className="px-4 pb-1 pt-3 text-sm">Waiting for an answer</h3>
      {pending.length === 0 ? (
        <p className="px-4 pb-3 text-sm text-ink-500">No open invitations.</p>
      ) : (
        <div className="overflow-x-auto pb-2">
          <table className={PANEL_TABLE_CLASS}>
            <thead>
              <tr>
                <th scope="col">E-mail</th>
                <th scope="col">Role</th>
                <th scope="col">Expires</th>
                <th scope="col">Actions</th>
              </tr>
            </thead>
            <tbody>
              {pending.map((invitation) => (
                <tr key={invitation.id} data-testid="invitation-row">
                  <td>{invitation.email}</td>
                  <td>{FIRM_ROLE_LABELS[invitation.role] ?? invitation.role}</td>
                  <td className="whitespace-nowrap">{formatDate(invitation.expiresAt)}</td>
                  <td>
                    <ConfirmButton
                      label="Withdraw"
                      ariaLabel={`Withdraw the invitation to ${invitation.email}`}
                      confirmLabel="Withdraw it"
                      onConfirm={() => cancel(invitation.id)}
                      testId="withdraw-invitation"
                    />
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
