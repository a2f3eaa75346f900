import { type ExpressionBuilder, sql, type Transaction } from 'kysely';
import { AUDIT_KINDS, type AuditQuery } from '../../contracts/audit';
import type { Database } from '../db/schema';
import type { AuditEvent } from './audit-log';

/** Appends one entry to the audit log. */
export async function insertAuditEntry(trx: Transaction<Database>, event: AuditEvent): Promise<void> {
  await trx
    .insertInto('audit_log')
    .values({
      actor_user_id: event.actorUserId,
      firm_id: event.firmId,
      action: event.action,
      outcome: event.outcome ?? 'ok',
      object_type: event.objectType ?? null,
      object_id: event.objectId ?? null,
      summary: JSON.stringify(event.summary ?? {}),
      ip_address: event.ipAddress ?? null,
    })
    .execute();
}

type Filter = Omit<AuditQuery, 'limit' | 'offset'> & { firmId: string | null };

/** The filters as one condition: the firm's entries (or all), a person, a kind, a range of UTC days. */
function filtered(filter: Filter) {
  return (eb: ExpressionBuilder<Database & { a: Database['audit_log'] }, 'a'>) => {
    const conditions = [];
    if (filter.firmId !== null) conditions.push(eb('a.firm_id', '=', filter.firmId));
    if (filter.person) conditions.push(eb('a.actor_user_id', '=', filter.person));
    if (filter.kind) conditions.push(eb.or(AUDIT_KINDS[filter.kind].prefixes.map((p) => eb('a.action', 'like', `${p}%`))));
    if (filter.from) conditions.push(eb('a.occurred_at', '>=', new Date(`${filter.from}T00:00:00Z`)));
    if (filter.to)
      conditions.push(eb('a.occurred_at', '<', sql<Date>`${`${filter.to}T00:00:00Z`}::timestamptz + interval '1 day'`));
    return eb.and(conditions);
  };
}

/** The name of the object an entry is about, where the bank knows one. */
const objectName = sql<string | null>`coalesce(
  case a.object_type
    when 'submission' then (select s.source_file_name from submission s where s.id::text = a.object_id)
    when 'person' then (select p.name from "user" p where p.id = a.object_id)
    when 'member' then (select p.name from member m join "user" p on p.id = m."userId" where m.id = a.object_id)
    when 'firm' then (select o.name from organization o where o.id = a.object_id)
    when 'geological_unit' then (select g.name from geological_unit g where g.id::text = a.object_id)
    when 'region' then (select r.name from region r where r.id::text = a.object_id)
    when 'api_key' then (select k.name from apikey k where k.id = a.object_id)
  end, null)`;

/** Audit entries, newest first, with the names of the person, the firm and the object. */
export async function listAuditEntries(trx: Transaction<Database>, filter: Filter, page: { limit: number; offset: number }) {
  return trx
    .selectFrom('audit_log as a')
    .leftJoin('user as u', 'u.id', 'a.actor_user_id')
    .leftJoin('organization as o', 'o.id', 'a.firm_id')
    .select([
      'a.id',
      'a.occurred_at as occurredAt',
      'u.name as actor',
      'a.actor_user_id as actorUserId',
      'a.firm_id as firmId',
      'o.name as firmName',
      'a.action',
      'a.outcome',
      'a.object_type as objectType',
      'a.object_id as objectId',
      objectName.as('objectName'),
      'a.summary',
    ])
    .where(filtered(filter))
    .orderBy('a.id', 'desc')
    .limit(page.limit)
    .offset(page.offset)
    .execute();
}

export async function countAuditEntries(trx: Transaction<Database>, filter: Filter): Promise<number> {
  const row = await trx
    .selectFrom('audit_log as a')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where(filtered(filter))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** The people who appear as actors in the firm's log (or the whole log), by name. */
export async function auditActors(trx: Transaction<Database>, firmId: string | null) {
  let query = trx
    .selectFrom('audit_log as a')
    .innerJoin('user as u', 'u.id', 'a.actor_user_id')
    .select(['u.id as userId', 'u.name'])
    .distinct()
    .orderBy('u.name')
    .limit(500);
  if (firmId !== null) query = query.where('a.firm_id', '=', firmId);
  return query.execute();
}
