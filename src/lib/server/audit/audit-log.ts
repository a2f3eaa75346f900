import type { Kysely, Transaction } from 'kysely';
import type { Database } from '../db/schema';
import type { ActingPerson } from './acting-person';
import { insertAuditEntry } from './audit-repository';

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

/** The actor fields of an audit event, from the acting person (`firmId` as they act for it). */
export function auditedBy(person: ActingPerson): Pick<AuditEvent, 'actorUserId' | 'firmId' | 'ipAddress'> {
  return { actorUserId: person.userId, firmId: person.firmId, ipAddress: person.ipAddress };
}

/**
 * Appends one entry to the audit log on its own (a refusal, a sign-in). Inside a service's
 * transaction, use `insertAuditEntry(trx, …)` so the entry commits or rolls back with the change.
 */
export async function recordAudit(db: Kysely<Database>, event: AuditEvent): Promise<void> {
  if (db.isTransaction) return insertAuditEntry(db as Transaction<Database>, event);
  await db.transaction().execute((trx) => insertAuditEntry(trx, event));
}
