import type { Transaction } from 'kysely';
import type { AppServices } from '../app-services';
import { recordAudit } from '../audit/audit-log';
import type { Database } from '../db/schema';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { FirmCaller } from './firm-caller';

/** A read for a firm operation, in the caller's tenant scope. */
export function readAsCaller<T>(
  app: Pick<AppServices, 'db'>,
  caller: FirmCaller,
  fn: (trx: Transaction<Database>) => Promise<T>,
): Promise<T> {
  return inTenantTransaction(app.db, scopeOf(caller.identity), fn);
}

/** The audit entry of a firm operation better-auth has carried out for the caller. */
export async function auditFirmAction(
  app: Pick<AppServices, 'db'>,
  caller: FirmCaller,
  event: { firmId: string; action: string; objectType: string; objectId: string; summary?: Record<string, unknown> },
): Promise<void> {
  await recordAudit(app.db, { actorUserId: caller.identity.user.id, ipAddress: caller.ipAddress, ...event });
}
