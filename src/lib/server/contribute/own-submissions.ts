import type { Transaction } from 'kysely';
import type { OwnSubmission, SubmissionStatus, SubmissionStatusChange } from '../../contracts/submissions';
import type { AppServices } from '../app-services';
import type { Database } from '../db/schema';
import { InvalidStateError, NotFoundError } from '../errors';
import { enqueueMail } from '../mail/outbox';
import { countFlaggedRecords, ownRecordsOf } from '../records/record-repository';
import { setRecordStatuses } from '../records/record-store-repository';
import { findSubmissionSummary, lockSubmission, submissionHistory } from '../submissions/submission-repository';
import { transitionSubmission } from '../submissions/transition';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { Contributor } from './contributor';
import { stewardsNewSubmissionMails } from './notifications';

const NOT_FOUND = 'Your firm has no submission with that id.';
const WITHDRAWABLE: readonly SubmissionStatus[] = ['draft', 'submitted', 'in_review', 'returned'];

/** The firm's own submission, locked for a status change (404 for any other firm's). */
async function lockOwnSubmission(trx: Transaction<Database>, contributor: Contributor, submissionId: string) {
  const submission = await lockSubmission(trx, submissionId, contributor.firmId);
  if (!submission) throw new NotFoundError(NOT_FOUND);
  return submission;
}

/** One of the firm's own submissions with every record in full (private details included) and its history. */
export async function ownSubmission(app: Pick<AppServices, 'db'>, firmId: string, submissionId: string): Promise<OwnSubmission> {
  return inTenantTransaction(app.db, firmScope(firmId), async (trx) => {
    const submission = await findSubmissionSummary(trx, submissionId, { firmId, pastDraft: false });
    if (!submission) throw new NotFoundError(NOT_FOUND);
    const records = await ownRecordsOf(trx, submissionId);
    const history = await submissionHistory(trx, submissionId);
    return { submission, records, history };
  });
}

/** Sends a returned submission back for review after its records were corrected. */
export async function resubmit(
  app: Pick<AppServices, 'db' | 'appUrl'>,
  contributor: Contributor,
  submissionId: string,
): Promise<SubmissionStatusChange> {
  return inTenantTransaction(app.db, firmScope(contributor.firmId), async (trx) => {
    const submission = await lockOwnSubmission(trx, contributor, submissionId);
    if (submission.status !== 'returned') {
      throw new InvalidStateError(`Only a returned submission can be sent back; this one is ${submission.status}.`);
    }
    await setRecordStatuses(trx, submissionId, ['returned'], 'pending');
    await transitionSubmission(trx, {
      submissionId,
      firmId: contributor.firmId,
      from: 'returned',
      to: 'submitted',
      actor: contributor,
      action: 'submission.resubmitted',
      set: { submitted_at: new Date() },
    });
    const mails = await stewardsNewSubmissionMails(trx, {
      submissionId,
      firmId: contributor.firmId,
      rowCount: submission.rowCount,
      flaggedRows: await countFlaggedRecords(trx, submissionId),
      appUrl: app.appUrl,
      resubmitted: true,
    });
    await enqueueMail(trx, mails);
    return { submission: { id: submissionId, status: 'submitted' } };
  });
}

/** Withdraws a submission that is not yet decided; its records leave the review queue. */
export async function withdraw(
  app: Pick<AppServices, 'db'>,
  contributor: Contributor,
  submissionId: string,
): Promise<SubmissionStatusChange> {
  return inTenantTransaction(app.db, firmScope(contributor.firmId), async (trx) => {
    const submission = await lockOwnSubmission(trx, contributor, submissionId);
    if (!WITHDRAWABLE.includes(submission.status)) {
      throw new InvalidStateError(`A submission that is ${submission.status} cannot be withdrawn.`);
    }
    await setRecordStatuses(trx, submissionId, ['pending', 'returned'], 'withdrawn');
    await transitionSubmission(trx, {
      submissionId,
      firmId: contributor.firmId,
      from: submission.status,
      to: 'withdrawn',
      actor: contributor,
      action: 'submission.withdrawn',
    });
    return { submission: { id: submissionId, status: 'withdrawn' } };
  });
}
