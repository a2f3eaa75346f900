import type { Kysely } from 'kysely';
import type { Database } from '../db/schema';

export interface AuditEvent {
  actorUserId: string | null;
  firmId: string | null;
  /** dotted verb, e.g. auth.sign_in, permission.refused, firm.member_role_changed */
  action: string;
  outcome?: 'ok' | 'refused' | 'failed';
  objectType?: string | null;
  objectId?: string | null;
  /** before/after or other facts worth keeping; never passwords, tokens or keys */
  summary?: Record<string, unknown>;
  ipAddress?: string | null;
}

/** Appends one entry to the audit log. */
export async function recordAudit(db: Kysely<Database>, event: AuditEvent): Promise<void> {
  await db
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
