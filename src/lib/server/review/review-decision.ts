import type { Transaction } from 'kysely';
import type { DecisionResult, ReviewDecision } from '../../contracts/review';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { insertAuditEntry } from '../audit/audit-repository';
import { contributorDecisionMail } from '../contribute/notifications';
import type { Database } from '../db/schema';
import { InvalidInputError, InvalidStateError, NotFoundError } from '../errors';
import { enqueueMail } from '../mail/outbox';
import { insertBankVersion, queueSearchUpserts } from '../records/publication-repository';
import { pendingRecordsOf } from '../records/record-repository';
import { returnRecordsWithComments, setRecordStatuses } from '../records/record-store-repository';
import { lockSubmission } from '../submissions/submission-repository';
import { transitionSubmission } from '../submissions/transition';
import { STEWARD_SCOPE } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';

export type Steward = ActingPerson & { userId: string };

const DECIDED = { accept: 'accepted', return: 'returned', reject: 'rejected' } as const;

type PendingRecord = Awaited<ReturnType<typeof pendingRecordsOf>>[number];

/** The submission, locked, if a steward may decide it now. */
async function decidableSubmission(trx: Transaction<Database>, submissionId: string) {
  const submission = await lockSubmission(trx, submissionId);
  if (!submission || submission.status === 'draft') throw new NotFoundError('There is no such submission waiting for review.');
  if (submission.status !== 'submitted' && submission.status !== 'in_review') {
    throw new InvalidStateError(`This submission is ${submission.status}; only submitted ones can be decided.`);
  }
  return submission;
}

/** 400 when a record comment names a record that is not pending in this submission. */
function checkRecordComments(decision: ReviewDecision, pending: ReadonlyMap<string, number | null>) {
  const comments = decision.recordComments ?? [];
  const unknown = comments.flatMap((c, index) => (pending.has(c.recordId) ? [] : [index]));
  if (unknown.length === 0) return comments;
  throw new InvalidInputError(
    'Some comments name records that are not pending in this submission.',
    unknown.map((index) => ({ path: `recordComments.${index}.recordId`, message: 'Not a pending record of this submission.' })),
  );
}

/** Publishes every pending record in a new bank version and queues them for the search index. */
async function publish(trx: Transaction<Database>, steward: Steward, submissionId: string, records: readonly PendingRecord[]) {
  const bankVersion = await insertBankVersion(trx, {
    publishedBy: steward.userId,
    note: `Submission ${submissionId}`,
    recordCount: records.length,
  });
  await setRecordStatuses(trx, submissionId, ['pending'], 'published', bankVersion);
  await queueSearchUpserts(
    trx,
    records.map((r) => r.id),
  );
  return bankVersion;
}

/** The platform-wide audit entry of a new bank version (no firm's). */
async function auditPublication(
  trx: Transaction<Database>,
  steward: Steward,
  bankVersion: number,
  submissionId: string,
  records: number,
) {
  await insertAuditEntry(trx, {
    actorUserId: steward.userId,
    firmId: null,
    action: 'bank.version_published',
    objectType: 'bank_version',
    objectId: String(bankVersion),
    summary: { submissionId, records },
    ipAddress: steward.ipAddress,
  });
}

/**
 * Applies a steward's decision in one transaction. Accept publishes every pending record in a new
 * bank version (and queues them for the search index); return sends the submission back with the
 * comments, marking commented records returned; reject closes it. The contributor gets one mail.
 */
export async function decideSubmission(
  app: Pick<AppServices, 'db' | 'appUrl'>,
  steward: Steward,
  submissionId: string,
  decision: ReviewDecision,
): Promise<DecisionResult> {
  return inTenantTransaction(app.db, STEWARD_SCOPE, async (trx) => {
    const submission = await decidableSubmission(trx, submissionId);
    const records = await pendingRecordsOf(trx, submissionId);
    const rowOf = new Map(records.map((r) => [r.id, r.rowNumber]));
    const recordComments = checkRecordComments(decision, rowOf);
    const toStatus = DECIDED[decision.action];
    let bankVersion: number | null = null;
    if (decision.action === 'accept') bankVersion = await publish(trx, steward, submissionId, records);
    if (decision.action === 'return') await returnRecordsWithComments(trx, recordComments);
    if (decision.action === 'reject') await setRecordStatuses(trx, submissionId, ['pending', 'returned'], 'rejected');
    const published = decision.action === 'accept' ? records.length : 0;
    const comment = decision.comment ?? null;
    await transitionSubmission(trx, {
      submissionId,
      firmId: submission.firmId,
      from: submission.status,
      to: toStatus,
      actor: steward,
      comment,
      action: `submission.${toStatus}`,
      set: { steward_comment: comment, decided_at: new Date(), decided_by: steward.userId },
      summary: { comment, recordComments: recordComments.length, bankVersion, published },
    });
    if (bankVersion !== null) await auditPublication(trx, steward, bankVersion, submissionId, records.length);
    const mail = await contributorDecisionMail(trx, submission.submittedBy, {
      submissionId,
      decision: toStatus,
      comment,
      recordComments: recordComments.map((c) => ({ rowNumber: rowOf.get(c.recordId) ?? null, comment: c.comment })),
      rowCount: submission.rowCount,
      bankVersion,
      appUrl: app.appUrl,
    });
    await enqueueMail(trx, mail);
    const returnedRecords = decision.action === 'return' ? recordComments.length : 0;
    return { submission: { id: submissionId, status: toStatus, bankVersion, published, returnedRecords } };
  });
}
