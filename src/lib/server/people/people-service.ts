import type { DirectoryQuery, PeopleList, PersonEntry, SuspendPersonInput, SuspensionResult } from '../../contracts/people';
import { isFirmRole, isPlatformRole } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import { recordAudit } from '../audit/audit-log';
import { rethrowAuthError } from '../auth/auth-errors';
import { NotFoundError, RefusedError } from '../errors';
import type { FirmCaller } from '../firms/firm-caller';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { countPeople, findPersonRow, listPeopleRows } from './people-repository';

type PersonRow = NonNullable<Awaited<ReturnType<typeof findPersonRow>>>;

function toPerson(row: PersonRow): PersonEntry {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    platformRole: isPlatformRole(row.role) ? row.role : 'user',
    emailVerified: row.emailVerified,
    suspended: row.banned === true,
    suspendedReason: row.banned ? row.banReason : null,
    createdAt: row.createdAt,
    firms: row.firms.flatMap((firm) => (isFirmRole(firm.role) ? [{ ...firm, role: firm.role }] : [])),
  };
}

/** People (accounts), searched by name or e-mail address, with their firms and whether they are suspended. */
export async function listPeople(app: Pick<AppServices, 'db'>, query: DirectoryQuery): Promise<PeopleList> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => ({
    people: (await listPeopleRows(trx, query)).map(toPerson),
    total: await countPeople(trx, query.q),
  }));
}

async function findPerson(app: Pick<AppServices, 'db'>, userId: string): Promise<PersonEntry> {
  const row = await inTenantTransaction(app.db, NO_TENANT, (trx) => findPersonRow(trx, userId));
  if (!row) throw new NotFoundError('There is no such person.');
  return toPerson(row);
}

/**
 * Suspends a person (better-auth's ban: every session ends at once and signing in is refused with the
 * reason) or lifts the suspension. The platform admin cannot suspend themselves.
 */
export async function setSuspension(
  app: Pick<AppServices, 'db' | 'auth'>,
  admin: FirmCaller,
  userId: string,
  input: SuspendPersonInput,
): Promise<SuspensionResult> {
  const before = await findPerson(app, userId);
  if (userId === admin.identity.user.id) throw new RefusedError('You cannot suspend yourself.');
  try {
    if (input.suspended) await app.auth.api.banUser({ headers: admin.headers, body: { userId, banReason: input.reason } });
    else await app.auth.api.unbanUser({ headers: admin.headers, body: { userId } });
  } catch (error) {
    rethrowAuthError(error);
  }
  await recordAudit(app.db, {
    actorUserId: admin.identity.user.id,
    firmId: null,
    action: input.suspended ? 'person.suspended' : 'person.reinstated',
    objectType: 'person',
    objectId: userId,
    summary: { name: before.name, email: before.email, ...(input.suspended ? { reason: input.reason } : {}) },
    ipAddress: admin.ipAddress,
  });
  return { person: await findPerson(app, userId) };
}
