import type { Kysely } from 'kysely';
import { hasPermission } from '../../permissions/roles';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Database } from '../db/schema';

/** Audit entries: all of them for platform admins, the active firm's for its owner and admins. */
export async function listAudit(db: Kysely<Database>, identity: ResolvedIdentity, page: { limit: number; offset: number }) {
  const everything = hasPermission(identity.actor, 'audit', 'read-all');
  let query = db
    .selectFrom('audit_log as a')
    .leftJoin('user as u', 'u.id', 'a.actor_user_id')
    .select([
      'a.id',
      'a.occurred_at as occurredAt',
      'u.name as actor',
      'a.firm_id as firmId',
      'a.action',
      'a.outcome',
      'a.object_type as objectType',
      'a.object_id as objectId',
      'a.summary',
    ])
    .orderBy('a.id', 'desc')
    .limit(page.limit)
    .offset(page.offset);
  if (!everything) query = query.where('a.firm_id', '=', identity.actor.firmId ?? '');
  return query.execute();
}
