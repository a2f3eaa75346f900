import type { Kysely } from 'kysely';
import { recordAudit } from '../audit/audit-log';
import { PRIVATE_RECORD_COLUMNS, SHARED_RECORD_COLUMNS } from '../bank/record-columns';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { enqueueMail } from '../mail/outbox';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { stewardsNewSubmissionMails } from './notifications';
import type { Contributor } from './store-submission';

const firmScope = (firmId: string) => ({ firmId, platformRole: 'user' as const });

/** One of the firm's own submissions with every record in full (private details included) and its history. */
export async function ownSubmission(db: Kysely<Database>, firmId: string, submissionId: string) {
  return inTenantTransaction(db, firmScope(firmId), async (trx) => {
    const submission = await trx
      .selectFrom('submission')
      .select([
        'id',
        'status',
        'source_kind as sourceKind',
        'source_file_name as fileName',
        'row_count as rowCount',
        'submitted_at as submittedAt',
        'decided_at as decidedAt',
        'steward_comment as stewardComment',
      ])
      .where('id', '=', submissionId)
      .where('firm_id', '=', firmId)
      .executeTakeFirst();
    if (!submission) throw new ApiError('NOT_FOUND', 'Your firm has no submission with that id.');
    const records = await trx
      .selectFrom('test_record as r')
      .innerJoin('region', 'region.id', 'r.region_id')
      .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
      .leftJoin('test_record_private as p', 'p.test_record_id', 'r.id')
      .select([
        ...SHARED_RECORD_COLUMNS,
        ...PRIVATE_RECORD_COLUMNS,
        'r.row_number as rowNumber',
        'r.review_comment as reviewComment',
        'r.import_flags as importFlags',
      ])
      .where('r.submission_id', '=', submissionId)
      .orderBy('r.row_number')
      .execute();
    const history = await trx
      .selectFrom('submission_event as e')
      .leftJoin('user as u', 'u.id', 'e.actor_user_id')
      .select([
        'e.occurred_at as occurredAt',
        'u.name as actor',
        'e.from_status as fromStatus',
        'e.to_status as toStatus',
        'e.comment',
      ])
      .where('e.submission_id', '=', submissionId)
      .orderBy('e.occurred_at')
      .execute();
    return { submission, records, history };
  });
}

/** Sends a returned submission back for review after its records were corrected. */
export async function resubmit(db: Kysely<Database>, contributor: Contributor, submissionId: string, appUrl: string) {
  return inTenantTransaction(db, firmScope(contributor.firmId), async (trx) => {
    const submission = await trx
      .selectFrom('submission')
      .select(['id', 'status', 'row_count'])
      .where('id', '=', submissionId)
      .where('firm_id', '=', contributor.firmId)
      .forUpdate()
      .executeTakeFirst();
    if (!submission) throw new ApiError('NOT_FOUND', 'Your firm has no submission with that id.');
    if (submission.status !== 'returned')
      throw new ApiError('CONFLICT', `Only a returned submission can be sent back; this one is ${submission.status}.`);
    const now = new Date();
    await trx
      .updateTable('test_record')
      .set({ status: 'pending', updated_at: now })
      .where('submission_id', '=', submissionId)
      .where('status', '=', 'returned')
      .execute();
    await trx
      .updateTable('submission')
      .set({ status: 'submitted', submitted_at: now, updated_at: now })
      .where('id', '=', submissionId)
      .execute();
    await trx
      .insertInto('submission_event')
      .values({
        submission_id: submissionId,
        actor_user_id: contributor.userId,
        from_status: 'returned',
        to_status: 'submitted',
        comment: null,
      })
      .execute();
    await recordAudit(trx, {
      actorUserId: contributor.userId,
      firmId: contributor.firmId,
      action: 'submission.resubmitted',
      objectType: 'submission',
      objectId: submissionId,
      summary: { before: 'returned', after: 'submitted' },
      ipAddress: contributor.ipAddress,
    });
    const flagged = await trx
      .selectFrom('test_record')
      .select((eb) => eb.fn.countAll<number>().as('n'))
      .where('submission_id', '=', submissionId)
      .where((eb) => eb(eb.fn('jsonb_array_length', ['import_flags']), '>', 0))
      .executeTakeFirstOrThrow();
    await enqueueMail(
      trx,
      await stewardsNewSubmissionMails(trx, {
        submissionId,
        firmId: contributor.firmId,
        rowCount: submission.row_count,
        flaggedRows: flagged.n,
        appUrl,
        resubmitted: true,
      }),
    );
    return { id: submissionId, status: 'submitted' as const };
  });
}

/** Withdraws a submission that is not yet accepted; its records leave the review queue. */
export async function withdraw(db: Kysely<Database>, contributor: Contributor, submissionId: string) {
  return inTenantTransaction(db, firmScope(contributor.firmId), async (trx) => {
    const submission = await trx
      .selectFrom('submission')
      .select(['id', 'status'])
      .where('id', '=', submissionId)
      .where('firm_id', '=', contributor.firmId)
      .forUpdate()
      .executeTakeFirst();
    if (!submission) throw new ApiError('NOT_FOUND', 'Your firm has no submission with that id.');
    if (!['draft', 'submitted', 'in_review', 'returned'].includes(submission.status)) {
      throw new ApiError('CONFLICT', `A submission that is ${submission.status} cannot be withdrawn.`);
    }
    const now = new Date();
    await trx
      .updateTable('test_record')
      .set({ status: 'withdrawn', updated_at: now })
      .where('submission_id', '=', submissionId)
      .where('status', 'in', ['pending', 'returned'])
      .execute();
    await trx.updateTable('submission').set({ status: 'withdrawn', updated_at: now }).where('id', '=', submissionId).execute();
    await trx
      .insertInto('submission_event')
      .values({
        submission_id: submissionId,
        actor_user_id: contributor.userId,
        from_status: submission.status,
        to_status: 'withdrawn',
        comment: null,
      })
      .execute();
    await recordAudit(trx, {
      actorUserId: contributor.userId,
      firmId: contributor.firmId,
      action: 'submission.withdrawn',
      objectType: 'submission',
      objectId: submissionId,
      summary: { before: submission.status, after: 'withdrawn' },
      ipAddress: contributor.ipAddress,
    });
    return { id: submissionId, status: 'withdrawn' as const };
  });
}
