import type { Transaction } from 'kysely';
import type { SubmissionStatus } from '../../contracts/submissions';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { SubmissionUpdate } from '../db/bank-tables';
import type { Database } from '../db/schema';
import { insertSubmissionEvent, updateSubmission } from './submission-repository';

export interface SubmissionTransition {
  submissionId: string;
  /** the submission's firm, for the audit entry */
  firmId: string;
  /** null when the submission was created in this transaction */
  from: SubmissionStatus | null;
  to: SubmissionStatus;
  actor: ActingPerson;
  /** the comment shown in the history (a steward's decision) */
  comment?: string | null;
  /** audit action, e.g. `submission.withdrawn` */
  action: string;
  /** facts for the audit entry besides before and after */
  summary?: Record<string, unknown>;
  /** other columns that change with the status (decision, submission time) */
  set?: Omit<SubmissionUpdate, 'status' | 'id' | 'firm_id'>;
}

/**
 * The one way a submission changes status: the new status (with the columns that go with it), the
 * history event and the audit entry, all in the caller's transaction. The caller has locked the
 * submission and checked that the step is allowed.
 */
export async function transitionSubmission(trx: Transaction<Database>, step: SubmissionTransition): Promise<void> {
  await updateSubmission(trx, step.submissionId, { ...step.set, status: step.to });
  await insertSubmissionEvent(trx, {
    submission_id: step.submissionId,
    actor_user_id: step.actor.userId,
    from_status: step.from,
    to_status: step.to,
    comment: step.comment ?? null,
  });
  await insertAuditEntry(trx, {
    ...auditedBy(step.actor),
    firmId: step.firmId,
    action: step.action,
    objectType: 'submission',
    objectId: step.submissionId,
    summary: { before: step.from, after: step.to, ...step.summary },
  });
}
