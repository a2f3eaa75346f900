import { recordAudit } from '../audit/audit-log';
import { rethrowAuthError } from '../auth/auth-errors';
import { ApiError } from '../http/api-error';
import type { FirmDeps } from './firm-service';
import { discardNewInvitation, withUndo } from './undo-create';

const INVITE_MESSAGES = {
  USER_IS_ALREADY_A_MEMBER_OF_THIS_ORGANIZATION: 'That person is already a member of your firm.',
  USER_IS_ALREADY_INVITED_TO_THIS_ORGANIZATION: 'That address already has a pending invitation.',
  INVITATION_LIMIT_REACHED: 'Your firm has reached its limit of pending invitations.',
};

export async function inviteMember(deps: FirmDeps, firmId: string, email: string, role: string) {
  try {
    const invitation = await deps.auth.api.createInvitation({
      headers: deps.headers,
      body: { email, role: role as 'engineer', organizationId: firmId },
    });
    await withUndo(
      () =>
        recordAudit(deps.db, {
          actorUserId: deps.identity.user.id,
          firmId,
          action: 'firm.invitation_sent',
          objectType: 'invitation',
          objectId: invitation.id,
          summary: { email, role },
          ipAddress: deps.ipAddress,
        }),
      () => discardNewInvitation(deps.db, invitation.id),
    );
    return {
      id: invitation.id,
      email: invitation.email,
      role: invitation.role,
      status: invitation.status,
      expiresAt: invitation.expiresAt,
    };
  } catch (error) {
    rethrowAuthError(error, INVITE_MESSAGES);
  }
}

export async function cancelInvitation(deps: FirmDeps, firmId: string, invitationId: string) {
  const invitation = await deps.db
    .selectFrom('invitation')
    .select(['id', 'status'])
    .where('id', '=', invitationId)
    .where('organizationId', '=', firmId)
    .executeTakeFirst();
  if (!invitation) throw new ApiError('NOT_FOUND', 'There is no such invitation in your active firm.');
  try {
    await deps.auth.api.cancelInvitation({ headers: deps.headers, body: { invitationId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await recordAudit(deps.db, {
    actorUserId: deps.identity.user.id,
    firmId,
    action: 'firm.invitation_cancelled',
    objectType: 'invitation',
    objectId: invitationId,
    ipAddress: deps.ipAddress,
  });
}

/** An invitation addressed to the signed-in person (404 for anyone else, so ids reveal nothing). */
export async function invitationForRecipient(deps: FirmDeps, invitationId: string) {
  const row = await deps.db
    .selectFrom('invitation')
    .innerJoin('organization', 'organization.id', 'invitation.organizationId')
    .select([
      'invitation.id',
      'invitation.email',
      'invitation.role',
      'invitation.status',
      'invitation.expiresAt',
      'organization.name as firmName',
      'organization.id as firmId',
    ])
    .where('invitation.id', '=', invitationId)
    .executeTakeFirst();
  if (!row || row.email.toLowerCase() !== deps.identity.user.email.toLowerCase()) {
    throw new ApiError(
      'NOT_FOUND',
      'This invitation is not for the address you are signed in with. Sign in with the invited address.',
    );
  }
  return row;
}

export async function respondToInvitation(deps: FirmDeps, invitationId: string, accept: boolean) {
  const invitation = await invitationForRecipient(deps, invitationId);
  if (invitation.status !== 'pending') throw new ApiError('CONFLICT', `This invitation is already ${invitation.status}.`);
  if (new Date(invitation.expiresAt) < new Date())
    throw new ApiError('CONFLICT', 'This invitation has expired. Ask the firm to send a new one.');
  try {
    if (accept) {
      await deps.auth.api.acceptInvitation({ headers: deps.headers, body: { invitationId } });
      await deps.auth.api.setActiveOrganization({ headers: deps.headers, body: { organizationId: invitation.firmId } });
    } else {
      await deps.auth.api.rejectInvitation({ headers: deps.headers, body: { invitationId } });
    }
  } catch (error) {
    rethrowAuthError(error, {
      EMAIL_VERIFICATION_REQUIRED_BEFORE_ACCEPTING_OR_REJECTING_INVITATION: 'Confirm your e-mail address first.',
    });
  }
  await recordAudit(deps.db, {
    actorUserId: deps.identity.user.id,
    firmId: invitation.firmId,
    action: accept ? 'firm.invitation_accepted' : 'firm.invitation_rejected',
    objectType: 'invitation',
    objectId: invitationId,
    summary: { role: invitation.role },
    ipAddress: deps.ipAddress,
  });
  return { id: invitation.firmId, name: invitation.firmName };
}
