import type { Transaction } from 'kysely';
import type { AuditEntry } from '../../contracts/audit';
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

/** Audit entries, newest first: one firm's (`firmId`), or every entry (`firmId` null). */
export async function listAuditEntries(
  trx: Transaction<Database>,
  firmId: string | null,
  page: { limit: number; offset: number },
): Promise<AuditEntry[]> {
  let query = trx
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
  if (firmId !== null) query = query.where('a.firm_id', '=', firmId);
  return query.execute();
}
