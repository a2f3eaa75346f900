export { AUDIT_KINDS, type AuditKind, type AuditQuery, auditQuerySchema } from '../schemas/audit-query';

/** One entry of the audit log, as `GET /api/audit` lists it (newest first). */
export interface AuditEntry {
  id: number;
  occurredAt: Date;
  /** the person's name; null for a script, the system or an unknown person */
  actor: string | null;
  actorUserId: string | null;
  firmId: string | null;
  /** the firm's name, when the entry belongs to a firm */
  firmName: string | null;
  /** dotted verb, e.g. submission.accepted */
  action: string;
  outcome: string;
  objectType: string | null;
  objectId: string | null;
  /** the object's name where it has one (a file, a person, a unit, a key) */
  objectName: string | null;
  summary: Record<string, unknown>;
  /** the entry in plain words: "Rowan Pike merged Vennmoor Peat into …" */
  text: string;
}

/** `GET /api/audit` */
export interface AuditList {
  entries: AuditEntry[];
  total: number;
  /** the people who appear in the visible log, for the person filter */
  people: { userId: string; name: string }[];
}
