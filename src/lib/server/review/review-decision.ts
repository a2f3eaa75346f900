import type { Kysely } from 'kysely';
import type { ReviewDecision } from '../../schemas/review';
import { recordAudit } from '../audit/audit-log';
import { contributorDecisionMail } from '../contribute/notifications';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { enqueueMail } from '../mail/outbox';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { STEWARD_SCOPE } from './review-queue';

export interface Steward {
  userId: string;
  ipAddress: string | null;
}

const DECIDED = { accept: 'accepted', return: 'returned', reject: 'rejected' } as const;

/**
 * Applies a steward's decision in one transaction. Accept publishes every pending record in a new
 * bank version (and queues them for the search index); return sends the submission back with the
 * comments, marking commented records returned; reject closes it. The contributor gets one mail.
 */
export async function decideSubmission(
  db: Kysely<Database>,
  steward: Steward,
  submissionId: string,
  decision: ReviewDecision,
  appUrl: string,
) {
  return inTenantTransaction(db, STEWARD_SCOPE, async (trx) => {
    const submission = await trx
      .selectFrom('submission')
      .select(['id', 'status', 'firm_id', 'submitted_by', 'row_count'])
      .where('id', '=', submissionId)
      .forUpdate()
      .executeTakeFirst();
    if (!submission || submission.status === 'draft')
      throw new ApiError('NOT_FOUND', 'There is no such submission waiting for review.');
    if (submission.status !== 'submitted' && submission.status !== 'in_review') {
      throw new ApiError('CONFLICT', `This submission is ${submission.status}; only submitted ones can be decided.`);
    }
    const toStatus = DECIDED[decision.action];
    const records = await trx
      .selectFrom('test_record')
      .select(['id', 'row_number'])
      .where('submission_id', '=', submissionId)
      .where('status', '=', 'pending')
      .execute();
    const known = new Map(records.map((r) => [r.id, r.row_number]));
    const recordComments = decision.recordComments ?? [];
    const unknown = recordComments.filter((c) => !known.has(c.recordId));
    if (unknown.length) {
      throw new ApiError(
        'VALIDATION_FAILED',
        'Some comments name records that are not pending in this submission.',
        unknown.map((c) => ({
          path: `recordComments.${recordComments.indexOf(c)}.recordId`,
          message: 'Not a pending record of this submission.',
        })),
      );
    }

    let bankVersion: number | null = null;
    const now = new Date();
    if (decision.action === 'accept') {
      const version = await trx
        .insertInto('bank_version')
        .values({ published_by: steward.userId, note: `Submission ${submissionId}`, record_count: records.length })
        .returning('id')
        .executeTakeFirstOrThrow();
      bankVersion = version.id;
      await trx
        .updateTable('test_record')
        .set({ status: 'published', bank_version_id: bankVersion, updated_at: now })
        .where('submission_id', '=', submissionId)
        .where('status', '=', 'pending')
        .execute();
      if (records.length) {
        await trx
          .insertInto('search_outbox')
          .values(records.map((r) => ({ entity_type: 'test_record', entity_id: r.id, operation: 'upsert' as const })))
          .execute();
      }
    } else if (decision.action === 'return') {
      for (const c of recordComments) {
        await trx
          .updateTable('test_record')
          .set({ status: 'returned', review_comment: c.comment, updated_at: now })
          .where('id', '=', c.recordId)
          .execute();
      }
    } else {
      await trx
        .updateTable('test_record')
        .set({ status: 'rejected', updated_at: now })
        .where('submission_id', '=', submissionId)
        .where('status', 'in', ['pending', 'returned'])
        .execute();
    }

    await trx
      .updateTable('submission')
      .set({
        status: toStatus,
        steward_comment: decision.comment ?? null,
        decided_at: now,
        decided_by: steward.userId,
        updated_at: now,
      })
      .where('id', '=', submissionId)
      .execute();
    await trx
      .insertInto('submission_event')
      .values({
        submission_id: submissionId,
        actor_user_id: steward.userId,
        from_status: submission.status,
        to_status: toStatus,
        comment: decision.comment ?? null,
      })
      .execute();
    await recordAudit(trx, {
      actorUserId: steward.userId,
      firmId: submission.firm_id,
      action: `submission.${toStatus}`,
      objectType: 'submission',
      objectId: submissionId,
      summary: {
        before: submission.status,
        after: toStatus,
        comment: decision.comment ?? null,
        recordComments: recordComments.length,
        bankVersion,
        published: decision.action === 'accept' ? records.length : 0,
      },
      ipAddress: steward.ipAddress,
    });
    if (bankVersion !== null) {
      await recordAudit(trx, {
        actorUserId: steward.userId,
        firmId: null,
        action: 'bank.version_published',
        objectType: 'bank_version',
        objectId: String(bankVersion),
        summary: { submissionId, records: records.length },
        ipAddress: steward.ipAddress,
      });
    }
    await enqueueMail(
      trx,
      await contributorDecisionMail(trx, submission.submitted_by, {
        submissionId,
        decision: toStatus,
        comment: decision.comment ?? null,
        recordComments: recordComments.map((c) => ({ rowNumber: known.get(c.recordId) ?? null, comment: c.comment })),
        rowCount: submission.row_count,
        bankVersion,
        appUrl,
      }),
    );
    return {
      id: submissionId,
      status: toStatus,
      bankVersion,
      published: decision.action === 'accept' ? records.length : 0,
      returnedRecords: decision.action === 'return' ? recordComments.length : 0,
    };
  });
}
