import type { AuditList } from '../../contracts/audit';
import { hasPermission } from '../../permissions/roles';
import type { AppServices } from '../app-services';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { listAuditEntries } from './audit-repository';

/** Audit entries: all of them for platform admins, the active firm's for its owner and admins. */
export async function listAudit(
  app: Pick<AppServices, 'db'>,
  identity: ResolvedIdentity,
  page: { limit: number; offset: number },
): Promise<AuditList> {
  const everything = hasPermission(identity.actor, 'audit', 'read-all');
  const firmId = everything ? null : (identity.actor.firmId ?? '');
  const entries = await inTenantTransaction(app.db, scopeOf(identity), (trx) => listAuditEntries(trx, firmId, page));
  return { entries };
}
