/** One entry of the audit log, as `GET /api/audit` lists it (newest first). */
export interface AuditEntry {
  id: number;
  occurredAt: Date;
  /** the person's name; null for a script, the system or an unknown person */
  actor: string | null;
  firmId: string | null;
  /** dotted verb, e.g. submission.accepted */
  action: string;
  outcome: string;
  objectType: string | null;
  objectId: string | null;
  summary: Record<string, unknown>;
}

/** `GET /api/audit` */
export interface AuditList {
  entries: AuditEntry[];
}
