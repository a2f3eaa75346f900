import type { ChangedMember, CreatedFirm, FirmOverview } from '../../contracts/firms';
import { slugify } from '../../import/vocabulary-match';
import type { FirmRole } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import { rethrowAuthError } from '../auth/auth-errors';
import { InvalidStateError, NotFoundError, RefusedError } from '../errors';
import { auditFirmAction, readAsCaller } from './firm-audit';
import type { FirmCaller } from './firm-caller';
import { findFirm, findMemberOfFirm, membersOfFirm, pendingInvitationsOfFirm } from './firm-repository';
import { discardNewFirm, withUndo } from './undo-create';

type FirmApp = Pick<AppServices, 'db' | 'auth'>;

/** A firm's slug: its name's, cut to 40 characters, with a random suffix so two firms may share a name. */
function firmSlug(name: string): string {
  const base = slugify(name).slice(0, 40);
  return `${base || 'firm'}-${Math.random().toString(36).slice(2, 7)}`;
}

/** Creates a firm with the caller as owner and makes it the active firm. */
export async function createFirm(app: FirmApp, caller: FirmCaller, name: string): Promise<CreatedFirm> {
  let firm: { id: string; name: string; slug: string } | null = null;
  try {
    firm = await app.auth.api.createOrganization({ headers: caller.headers, body: { name, slug: firmSlug(name) } });
  } catch (error) {
    rethrowAuthError(error, { YOU_HAVE_REACHED_THE_MAXIMUM_NUMBER_OF_ORGANIZATIONS: 'You belong to as many firms as allowed.' });
  }
  if (!firm) throw new Error('better-auth created no firm and raised no error');
  const made = firm;
  await withUndo(
    () =>
      auditFirmAction(app, caller, {
        firmId: made.id,
        action: 'firm.created',
        objectType: 'firm',
        objectId: made.id,
        summary: { name },
      }),
    () => discardNewFirm(app, caller, made.id),
  );
  return { firm: { id: made.id, name: made.name, slug: made.slug } };
}

/** Members of the active firm; invitations only for those who manage members. */
export async function describeFirm(app: FirmApp, caller: FirmCaller, firmId: string, canManage: boolean): Promise<FirmOverview> {
  return readAsCaller(app, caller, async (trx) => {
    const firm = await findFirm(trx, firmId);
    if (!firm) throw new NotFoundError('Your active firm no longer exists. Choose another firm in the header.');
    const members = await membersOfFirm(trx, firmId);
    const invitations = canManage ? await pendingInvitationsOfFirm(trx, firmId) : [];
    return { firm, myRole: caller.identity.actor.firmRole, members, invitations };
  });
}

/** A member of the caller's active firm, or 404: an id from another firm is treated as unknown. */
async function memberOfFirm(app: FirmApp, caller: FirmCaller, firmId: string, memberId: string) {
  const member = await readAsCaller(app, caller, (trx) => findMemberOfFirm(trx, firmId, memberId));
  if (!member) throw new NotFoundError('There is no such member in your active firm.');
  return member;
}

export async function changeMemberRole(
  app: FirmApp,
  caller: FirmCaller,
  firmId: string,
  memberId: string,
  role: FirmRole,
): Promise<ChangedMember> {
  const member = await memberOfFirm(app, caller, firmId, memberId);
  if (member.role === 'owner') throw new RefusedError("The firm owner's role cannot be changed.");
  if (member.userId === caller.identity.user.id)
    throw new RefusedError('You cannot change your own role; ask another owner or admin.');
  try {
    await app.auth.api.updateMemberRole({ headers: caller.headers, body: { memberId, role, organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await auditFirmAction(app, caller, {
    firmId,
    action: 'firm.member_role_changed',
    objectType: 'member',
    objectId: memberId,
    summary: { before: member.role, after: role },
  });
  return { member: { memberId, userId: member.userId, role } };
}

export async function removeMember(app: FirmApp, caller: FirmCaller, firmId: string, memberId: string): Promise<void> {
  const member = await memberOfFirm(app, caller, firmId, memberId);
  if (member.role === 'owner') throw new RefusedError('The firm owner cannot be removed.');
  if (member.userId === caller.identity.user.id) throw new RefusedError('Use "Leave firm" to remove yourself.');
  try {
    await app.auth.api.removeMember({ headers: caller.headers, body: { memberIdOrEmail: memberId, organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await auditFirmAction(app, caller, {
    firmId,
    action: 'firm.member_removed',
    objectType: 'member',
    objectId: memberId,
    summary: { before: { userId: member.userId, role: member.role } },
  });
}

export async function leaveFirm(app: FirmApp, caller: FirmCaller, firmId: string): Promise<void> {
  if (caller.identity.actor.firmRole === 'owner') {
    throw new InvalidStateError('The owner cannot leave the firm. Ask the platform admin to transfer ownership first.');
  }
  try {
    await app.auth.api.leaveOrganization({ headers: caller.headers, body: { organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await auditFirmAction(app, caller, { firmId, action: 'firm.member_left', objectType: 'firm', objectId: firmId, summary: {} });
}
