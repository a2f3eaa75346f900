import type { Kysely } from 'kysely';
import { hasPermission } from '../../permissions/roles';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Database } from '../db/schema';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';

/** Stewards see every submission past draft; everyone else their active firm's own. */
export async function listSubmissions(db: Kysely<Database>, identity: ResolvedIdentity) {
  const reviewer = hasPermission(identity.actor, 'submission', 'review');
  const firmId = identity.actor.firmId;
  return inTenantTransaction(db, scopeOf(identity), (trx) => {
    let query = trx
      .selectFrom('submission as s')
      .innerJoin('organization as firm', 'firm.id', 's.firm_id')
      .select([
        's.id',
        's.status',
        's.source_kind as sourceKind',
        's.source_file_name as fileName',
        's.row_count as rowCount',
        's.submitted_at as submittedAt',
        's.decided_at as decidedAt',
        's.steward_comment as stewardComment',
        'firm.name as firm',
      ])
      .orderBy('s.created_at', 'desc')
      .limit(500);
    query = reviewer
      ? query.where((eb) => eb.or([eb('s.status', '!=', 'draft'), ...(firmId ? [eb('s.firm_id', '=', firmId)] : [])]))
      : query.where('s.firm_id', '=', firmId ?? '');
    return query.execute();
  });
}
