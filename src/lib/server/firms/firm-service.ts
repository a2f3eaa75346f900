import type { Kysely } from 'kysely';
import type { FirmRole } from '../../permissions/roles';
import { recordAudit } from '../audit/audit-log';
import { rethrowAuthError } from '../auth/auth-errors';
import type { Auth } from '../auth/create-auth';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { discardNewFirm, withUndo } from './undo-create';

export interface FirmDeps {
  auth: Auth;
  db: Kysely<Database>;
  /** the caller's request headers (session cookie), so better-auth checks the same person again */
  headers: Headers;
  identity: ResolvedIdentity;
  ipAddress: string;
}

function slugify(name: string): string {
  const base = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40);
  return `${base || 'firm'}-${Math.random().toString(36).slice(2, 7)}`;
}

async function audit(
  deps: FirmDeps,
  firmId: string,
  action: string,
  objectType: string,
  objectId: string,
  summary: Record<string, unknown>,
) {
  await recordAudit(deps.db, {
    actorUserId: deps.identity.user.id,
    firmId,
    action,
    objectType,
    objectId,
    summary,
    ipAddress: deps.ipAddress,
  });
}

/** Creates a firm with the caller as owner and makes it the active firm. */
export async function createFirm(deps: FirmDeps, name: string) {
  let firm: { id: string; name: string; slug: string } | null = null;
  try {
    firm = await deps.auth.api.createOrganization({ headers: deps.headers, body: { name, slug: slugify(name) } });
  } catch (error) {
    rethrowAuthError(error, { YOU_HAVE_REACHED_THE_MAXIMUM_NUMBER_OF_ORGANIZATIONS: 'You belong to as many firms as allowed.' });
  }
  if (!firm) throw new ApiError('INTERNAL', 'The firm could not be created.');
  const made = firm;
  await withUndo(
    () => audit(deps, made.id, 'firm.created', 'firm', made.id, { name }),
    () => discardNewFirm(deps.db, made.id, deps.identity.actor.firmId),
  );
  return { id: made.id, name: made.name, slug: made.slug };
}

/** Members of the active firm; invitations only for those who manage members. */
export async function describeFirm(deps: FirmDeps, firmId: string, canManage: boolean) {
  const firm = await deps.db
    .selectFrom('organization')
    .select(['id', 'name', 'slug'])
    .where('id', '=', firmId)
    .executeTakeFirstOrThrow();
  const members = await deps.db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select([
      'member.id as memberId',
      'user.id as userId',
      'user.name',
      'user.email',
      'member.role',
      'member.createdAt as joinedAt',
    ])
    .where('member.organizationId', '=', firmId)
    .orderBy('member.createdAt')
    .execute();
  const invitations = canManage
    ? await deps.db
        .selectFrom('invitation')
        .select(['id', 'email', 'role', 'status', 'expiresAt'])
        .where('organizationId', '=', firmId)
        .where('status', '=', 'pending')
        .orderBy('createdAt', 'desc')
        .execute()
    : [];
  return { firm, myRole: deps.identity.actor.firmRole, members, invitations };
}

/** A member of the caller's active firm, or 404: an id from another firm is treated as unknown. */
async function memberOfFirm(deps: FirmDeps, firmId: string, memberId: string) {
  const member = await deps.db
    .selectFrom('member')
    .select(['id', 'userId', 'role'])
    .where('id', '=', memberId)
    .where('organizationId', '=', firmId)
    .executeTakeFirst();
  if (!member) throw new ApiError('NOT_FOUND', 'There is no such member in your active firm.');
  return member;
}

export async function changeMemberRole(deps: FirmDeps, firmId: string, memberId: string, role: FirmRole) {
  const member = await memberOfFirm(deps, firmId, memberId);
  if (member.role === 'owner') throw new ApiError('FORBIDDEN', "The firm owner's role cannot be changed.");
  if (member.userId === deps.identity.user.id)
    throw new ApiError('FORBIDDEN', 'You cannot change your own role; ask another owner or admin.');
  try {
    await deps.auth.api.updateMemberRole({ headers: deps.headers, body: { memberId, role, organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await audit(deps, firmId, 'firm.member_role_changed', 'member', memberId, { before: member.role, after: role });
  return { memberId, userId: member.userId, role };
}

export async function removeMember(deps: FirmDeps, firmId: string, memberId: string) {
  const member = await memberOfFirm(deps, firmId, memberId);
  if (member.role === 'owner') throw new ApiError('FORBIDDEN', 'The firm owner cannot be removed.');
  if (member.userId === deps.identity.user.id) throw new ApiError('FORBIDDEN', 'Use "Leave firm" to remove yourself.');
  try {
    await deps.auth.api.removeMember({ headers: deps.headers, body: { memberIdOrEmail: memberId, organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await audit(deps, firmId, 'firm.member_removed', 'member', memberId, { before: { userId: member.userId, role: member.role } });
}

export async function leaveFirm(deps: FirmDeps, firmId: string) {
  if (deps.identity.actor.firmRole === 'owner') {
    throw new ApiError('CONFLICT', 'The owner cannot leave the firm. Ask the platform admin to transfer ownership first.');
  }
  try {
    await deps.auth.api.leaveOrganization({ headers: deps.headers, body: { organizationId: firmId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await audit(deps, firmId, 'firm.member_left', 'firm', firmId, {});
}

/** The dependencies a firm operation needs, from an endpoint's context. */
export function firmDepsFrom(
  context: { request: Request; clientAddress: string },
  identity: ResolvedIdentity,
  services: { auth: Auth; db: Kysely<Database> },
): FirmDeps {
  return { ...services, headers: context.request.headers, identity, ipAddress: context.clientAddress };
}
