import type { DirectoryQuery, FirmDirectory, FirmEntry, OwnershipResult } from '../../contracts/people';
import { isFirmRole } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import { InvalidInputError, InvalidStateError, NotFoundError } from '../errors';
import { enqueueMail } from '../mail/outbox';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { countFirms, findFirmRow, listFirmRows, lockFirmMembers, setMemberRoles } from './firm-directory-repository';
import { formerOwnerMail, newOwnerMail } from './ownership-mail';

type FirmRow = NonNullable<Awaited<ReturnType<typeof findFirmRow>>>;

function toFirm(row: FirmRow): FirmEntry {
  return {
    id: row.id,
    name: row.name,
    createdAt: row.createdAt,
    members: row.members.flatMap((m) => (isFirmRole(m.role) ? [{ ...m, role: m.role }] : [])),
  };
}

/** Firms searched by name, each with its members and their roles. */
export async function listFirms(app: Pick<AppServices, 'db'>, query: DirectoryQuery): Promise<FirmDirectory> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => ({
    firms: (await listFirmRows(trx, query)).map(toFirm),
    total: await countFirms(trx, query.q),
  }));
}

/**
 * Passes a firm's ownership to one of its members (the platform admin's act: a firm's owner cannot
 * leave, so someone outside the firm must be able to hand it on). Whoever owned it until now becomes a
 * firm admin; both are told by mail, queued with the change.
 */
export async function passOwnership(
  app: Pick<AppServices, 'db' | 'appUrl'>,
  admin: ActingPerson,
  firmId: string,
  newOwnerMemberId: string,
): Promise<OwnershipResult> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => {
    const firm = await findFirmRow(trx, firmId);
    if (!firm) throw new NotFoundError('There is no such firm.');
    const members = await lockFirmMembers(trx, firmId);
    const target = members.find((m) => m.id === newOwnerMemberId);
    if (!target) {
      throw new InvalidInputError('That person is not a member of this firm.', [
        { path: 'newOwnerMemberId', message: `Choose one of the members of ${firm.name}.` },
      ]);
    }
    if (target.role === 'owner') throw new InvalidStateError('That member already owns the firm.');
    const formerOwners = members.filter((m) => m.role === 'owner');
    await setMemberRoles(
      trx,
      firmId,
      formerOwners.map((m) => m.id),
      'admin',
    );
    await setMemberRoles(trx, firmId, [target.id], 'owner');

    const after = toFirm((await findFirmRow(trx, firmId)) as FirmRow);
    const person = (userId: string) => after.members.find((m) => m.userId === userId);
    const newOwner = person(target.userId);
    const previous = formerOwners.flatMap((m) => person(m.userId) ?? []);
    if (!newOwner) throw new Error('the new owner vanished inside the transaction');
    await insertAuditEntry(trx, {
      ...auditedBy(admin),
      firmId,
      action: 'firm.ownership_passed',
      objectType: 'firm',
      objectId: firmId,
      summary: {
        firmName: firm.name,
        newOwner: { userId: newOwner.userId, name: newOwner.name },
        previousOwners: previous.map((m) => ({ userId: m.userId, name: m.name })),
      },
    });
    const firmUrl = `${app.appUrl}/firm`;
    await enqueueMail(trx, [
      newOwnerMail(newOwner, firm.name, firmUrl),
      ...previous.map((m) => formerOwnerMail(m, firm.name, newOwner.name, firmUrl)),
    ]);
    return {
      firm: after,
      newOwner: { userId: newOwner.userId, name: newOwner.name },
      previousOwners: previous.map((m) => ({ userId: m.userId, name: m.name })),
    };
  });
}
