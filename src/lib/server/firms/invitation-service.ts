import type { InvitationForRecipient, JoinedFirm, SentInvitation } from '../../contracts/firms';
import { type FirmRole, isFirmRole } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import { rethrowAuthError } from '../auth/auth-errors';
import { InvalidStateError, NotFoundError } from '../errors';
import { auditFirmAction, readAsCaller } from './firm-audit';
import type { FirmCaller } from './firm-caller';
import { findInvitationOfFirm, findInvitationWithFirm } from './firm-repository';
import { discardNewInvitation, withUndo } from './undo-create';

type FirmApp = Pick<AppServices, 'db' | 'auth'>;

const INVITE_MESSAGES = {
  USER_IS_ALREADY_A_MEMBER_OF_THIS_ORGANIZATION: 'That person is already a member of your firm.',
  USER_IS_ALREADY_INVITED_TO_THIS_ORGANIZATION: 'That address already has a pending invitation.',
  INVITATION_LIMIT_REACHED: 'Your firm has reached its limit of pending invitations.',
};

export async function inviteMember(
  app: FirmApp,
  caller: FirmCaller,
  firmId: string,
  email: string,
  role: Exclude<FirmRole, 'owner'>,
): Promise<SentInvitation> {
  let invitation: { id: string; email: string; role: string; status: string; expiresAt: Date };
  try {
    invitation = await app.auth.api.createInvitation({ headers: caller.headers, body: { email, role, organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error, INVITE_MESSAGES);
  }
  const made = invitation;
  await withUndo(
    () =>
      auditFirmAction(app, caller, {
        firmId,
        action: 'firm.invitation_sent',
        objectType: 'invitation',
        objectId: made.id,
        summary: { email, role },
      }),
    () => discardNewInvitation(app, caller, made.id),
  );
  const { id, status, expiresAt } = invitation;
  return { invitation: { id, email: invitation.email, role, status, expiresAt } };
}

export async function cancelInvitation(app: FirmApp, caller: FirmCaller, firmId: string, invitationId: string): Promise<void> {
  const invitation = await readAsCaller(app, caller, (trx) => findInvitationOfFirm(trx, firmId, invitationId));
  if (!invitation) throw new NotFoundError('There is no such invitation in your active firm.');
  try {
    await app.auth.api.cancelInvitation({ headers: caller.headers, body: { invitationId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await auditFirmAction(app, caller, {
    firmId,
    action: 'firm.invitation_cancelled',
    objectType: 'invitation',
    objectId: invitationId,
  });
}

/** An invitation addressed to the signed-in person (404 for anyone else, so ids reveal nothing). */
async function invitationFor(app: FirmApp, caller: FirmCaller, invitationId: string) {
  const row = await readAsCaller(app, caller, (trx) => findInvitationWithFirm(trx, invitationId));
  if (!row || row.email.toLowerCase() !== caller.identity.user.email.toLowerCase() || !isFirmRole(row.role)) {
    throw new NotFoundError('This invitation is not for the address you are signed in with. Sign in with the invited address.');
  }
  return { ...row, role: row.role };
}

/** What the invited person sees of an invitation (not the firm's id). */
export async function invitationForRecipient(
  app: FirmApp,
  caller: FirmCaller,
  invitationId: string,
): Promise<InvitationForRecipient> {
  const { firmId: _firmId, ...invitation } = await invitationFor(app, caller, invitationId);
  return { invitation };
}

export async function respondToInvitation(
  app: FirmApp,
  caller: FirmCaller,
  invitationId: string,
  accept: boolean,
): Promise<JoinedFirm | null> {
  const invitation = await invitationFor(app, caller, invitationId);
  if (invitation.status !== 'pending') throw new InvalidStateError(`This invitation is already ${invitation.status}.`);
  if (new Date(invitation.expiresAt) < new Date())
    throw new InvalidStateError('This invitation has expired. Ask the firm to send a new one.');
  try {
    if (accept) {
      await app.auth.api.acceptInvitation({ headers: caller.headers, body: { invitationId } });
      await app.auth.api.setActiveOrganization({ headers: caller.headers, body: { organizationId: invitation.firmId } });
    } else {
      await app.auth.api.rejectInvitation({ headers: caller.headers, body: { invitationId } });
    }
  } catch (error) {
    rethrowAuthError(error, {
      EMAIL_VERIFICATION_REQUIRED_BEFORE_ACCEPTING_OR_REJECTING_INVITATION: 'Confirm your e-mail address first.',
    });
  }
  await auditFirmAction(app, caller, {
    firmId: invitation.firmId,
    action: accept ? 'firm.invitation_accepted' : 'firm.invitation_rejected',
    objectType: 'invitation',
    objectId: invitationId,
    summary: { role: invitation.role },
  });
  return accept ? { firm: { id: invitation.firmId, name: invitation.firmName } } : null;
}
