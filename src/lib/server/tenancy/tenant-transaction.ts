import { type Kysely, sql, type Transaction } from 'kysely';
import type { PlatformRole } from '../../permissions/roles';
import type { Database } from '../db/schema';

/** Whose data a transaction may touch: the firm active in the session and the person's platform role. */
export interface TenantScope {
  firmId: string | null;
  platformRole: PlatformRole | null;
}

export const NO_TENANT: TenantScope = { firmId: null, platformRole: null };

/**
 * Runs fn in a transaction whose row-level-security context is the given scope. The settings are
 * transaction-local (set_config(…, true)), so nothing leaks to the next user of the pooled connection.
 * Every query that touches firm data goes through here.
 */
export function inTenantTransaction<T>(
  db: Kysely<Database>,
  scope: TenantScope,
  fn: (trx: Transaction<Database>) => Promise<T>,
): Promise<T> {
  return db.transaction().execute(async (trx) => {
    await sql`select set_config('app.firm_id', ${scope.firmId ?? ''}, true), set_config('app.platform_role', ${scope.platformRole ?? ''}, true)`.execute(
      trx,
    );
    return fn(trx);
  });
}
