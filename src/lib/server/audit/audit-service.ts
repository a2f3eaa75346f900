import type { AuditList, AuditQuery } from '../../contracts/audit';
import { hasPermission } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { auditActors, countAuditEntries, listAuditEntries } from './audit-repository';
import { describeEntry } from './describe-entry';

/**
 * A page of the audit log: everything for platform admins, the active firm's entries for its owner and
 * admins; filtered by person, kind and days; each entry with names and a plain-language sentence.
 */
export async function listAudit(app: Pick<AppServices, 'db'>, identity: ResolvedIdentity, query: AuditQuery): Promise<AuditList> {
  const everything = hasPermission(identity.actor, 'audit', 'read-all');
  const firmId = everything ? null : (identity.actor.firmId ?? '');
  const { limit, offset, ...filters } = query;
  const filter = { ...filters, firmId };
  return inTenantTransaction(app.db, scopeOf(identity), async (trx) => {
    const rows = await listAuditEntries(trx, filter, { limit, offset });
    return {
      entries: rows.map((row) => ({ ...row, text: describeEntry(row) })),
      total: await countAuditEntries(trx, filter),
      people: await auditActors(trx, firmId),
    };
  });
}
