import { useState } from 'react';
import type { FirmMember } from '../../lib/contracts/firms';
import type { Json } from '../../lib/contracts/json';
import { ASSIGNABLE_FIRM_ROLES, FIRM_ROLE_LABELS } from '../../lib/permissions/roles';
import FormMessage from '../account/FormMessage';
import { requestJson } from '../account/post-json';
import ConfirmButton from './ConfirmButton';
import { formatDate } from './format-date';
import { PANEL_TABLE_CLASS } from './panel-table';

interface MembersPanelProps {
  members: Json<FirmMember>[];
  currentUserId: string;
  canManage: boolean;
  onChanged(): Promise<void>;
}

/** The firm's members; owners and admins change roles and remove people, everyone else reads. */
export default function MembersPanel({ members, currentUserId, canManage, onChanged }: MembersPanelProps) {
  const [problem, setProblem] = useState<string | null>(null);

  async function act(method: 'PATCH' | 'DELETE', memberId: string, body?: unknown) {
    setProblem(null);
    const result = await requestJson(method, `/api/firm/members/${encodeURIComponent(memberId)}`, body);
    if (!result.ok) {
      setProblem(result.failure.message);
      return;
    }
    await onChanged();
  }

  const editable = (member: Json<FirmMember>) => canManage && member.role !== 'owner' && member.userId !== currentUserId;

  return (
    <section className="panel" aria-labelledby="members-heading" data-testid="members-panel">
      <div className="border-b border-ink-200 px-4 py-2">
        <h2 id="members-heading">Members</h2>
        {!canManage && (
          <p className="text-xs text-ink-500">Only the firm owner and firm admins can change roles or remove members.</p>
        )}
      </div>
      {problem && (
        <div className="px-4 pt-3">
          <FormMessage kind="error">{problem}</FormMessage>
        </div>
      )}
      <div className="overflow-x-auto">
        <table className={PANEL_TABLE_CLASS}>
          <thead>
            <tr>
              <th scope="col">Name</th>
              <th scope="col">E-mail</th>
              <th scope="col">Role</th>
              <th scope="col">Joined</th>
              {canManage && <th scope="col">Actions</th>}
            </tr>
          </thead>
          <tbody>
            {members.map((member) => (
              <tr key={member.memberId} data-testid="member-row">
                <td className="font-medium">
                  {member.name}
                  {member.userId === currentUserId && <span className="ml-1.5 text-xs font-normal text-ink-500">(you)</span>}
                </td>
                <td>{member.email}</td>
                <td>
                  {editable(member) ? (
                    <>
                      <label htmlFor={`role-${member.memberId}`} className="sr-only">
                        Role of {member.name}
                      </label>
                      <select
                        id={`role-${member.memberId}`}
                        className="rounded border border-ink-300 bg-white px-1 py-0.5 text-sm"
                        value={member.role}
                        onChange={(event) => void act('PATCH', member.memberId, { role: event.target.value })}
                        data-testid="member-role-select"
                      >
                        {ASSIGNABLE_FIRM_ROLES.map((role) => (
                          <option key={role} value={role}>
                            {FIRM_ROLE_LABELS[role]}
                          </option>
                        ))}
                      </select>
                    </>
                  ) : (
                    <span data-testid="member-role">{FIRM_ROLE_LABELS[member.role]}</span>
                  )}
                </td>
                <td className="whitespace-nowrap">{formatDate(member.joinedAt)}</td>
                {canManage && (
                  <td>
                    {editable(member) && (
                      <ConfirmButton
                        label="Remove"
                        ariaLabel={`Remove ${member.name}`}
                        confirmLabel={`Remove ${member.name}`}
                        onConfirm={() => act('DELETE', member.memberId)}
                        testId="remove-member"
                      />
                    )}
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
