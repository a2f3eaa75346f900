import { sql, type Transaction } from 'kysely';
import type { HistoryEvent, SubmissionStatus, SubmissionSummary } from '../../contracts/submissions';
import type { NewSubmission, NewSubmissionEvent, NewSubmissionFile, SubmissionUpdate } from '../db/bank-tables';
import type { Database } from '../db/schema';

/** The one summary select: every list and detail of submissions starts here. */
function summaries(trx: Transaction<Database>) {
  return trx
    .selectFrom('submission as s')
    .innerJoin('organization as firm', 'firm.id', 's.firm_id')
    .select([
      's.id',
      's.status',
      's.source_kind as sourceKind',
      's.source_file_name as fileName',
      's.row_count as rowCount',
      's.submitted_at as submittedAt',
      's.decided_at as decidedAt',
      's.steward_comment as stewardComment',
      'firm.name as firm',
    ]);
}

/**
 * Which submissions a list shows: one firm's own (`firmId`), and with `pastDraft` every firm's
 * submissions past draft as well (the stewards' view).
 */
export interface SubmissionFilter {
  firmId: string | null;
  pastDraft: boolean;
}

export async function listSubmissionSummaries(
  trx: Transaction<Database>,
  filter: SubmissionFilter,
  limit: number,
): Promise<SubmissionSummary[]> {
  return summaries(trx)
    .where((eb) =>
      eb.or([
        ...(filter.pastDraft ? [eb('s.status', '!=', 'draft')] : []),
        ...(filter.firmId ? [eb('s.firm_id', '=', filter.firmId)] : []),
        eb.val(false),
      ]),
    )
    .orderBy('s.created_at', 'desc')
    .limit(limit)
    .execute();
}

export async function findSubmissionSummary(
  trx: Transaction<Database>,
  submissionId: string,
  filter: SubmissionFilter,
): Promise<SubmissionSummary | undefined> {
  return summaries(trx)
    .where('s.id', '=', submissionId)
    .where((eb) =>
      eb.or([
        ...(filter.pastDraft ? [eb('s.status', '!=', 'draft')] : []),
        ...(filter.firmId ? [eb('s.firm_id', '=', filter.firmId)] : []),
        eb.val(false),
      ]),
    )
    .executeTakeFirst();
}

/** Submissions waiting for a steward, oldest first, with their flagged rows and days waited. */
export async function listWaitingForReview(trx: Transaction<Database>) {
  return summaries(trx)
    .select([
      sql<number>`(select count(*) from test_record t where t.submission_id = s.id and jsonb_array_length(t.import_flags) > 0)`.as(
        'flaggedRows',
      ),
      sql<number>`extract(epoch from (now() - s.submitted_at)) / 86400`.as('waitingDays'),
    ])
    .where('s.status', 'in', ['submitted', 'in_review'])
    .orderBy('s.submitted_at')
    .execute();
}

/** A submission locked for a status change; only `firmId`'s when given. */
export async function lockSubmission(trx: Transaction<Database>, submissionId: string, firmId?: string) {
  let query = trx
    .selectFrom('submission')
    .select(['id', 'status', 'firm_id as firmId', 'submitted_by as submittedBy', 'row_count as rowCount'])
    .where('id', '=', submissionId);
  if (firmId !== undefined) query = query.where('firm_id', '=', firmId);
  return query.forUpdate().executeTakeFirst();
}

/** The firm's live submission (not withdrawn or rejected) of the file with this checksum, if any. */
export async function findLiveSubmissionOfFile(trx: Transaction<Database>, firmId: string, sha256: string) {
  return trx
    .selectFrom('submission')
    .select(['id', 'status'])
    .where('firm_id', '=', firmId)
    .where('source_checksum_sha256', '=', sha256)
    .where('status', 'not in', ['withdrawn', 'rejected'])
    .executeTakeFirst();
}

export async function insertSubmission(trx: Transaction<Database>, values: NewSubmission): Promise<void> {
  await trx.insertInto('submission').values(values).execute();
}

export async function insertSubmissionFile(trx: Transaction<Database>, values: NewSubmissionFile): Promise<void> {
  await trx.insertInto('submission_file').values(values).execute();
}

export async function updateSubmission(
  trx: Transaction<Database>,
  submissionId: string,
  values: SubmissionUpdate & { status: SubmissionStatus },
): Promise<void> {
  await trx
    .updateTable('submission')
    .set({ ...values, updated_at: new Date() })
    .where('id', '=', submissionId)
    .execute();
}

export async function insertSubmissionEvent(trx: Transaction<Database>, event: NewSubmissionEvent): Promise<void> {
  await trx.insertInto('submission_event').values(event).execute();
}

/** Who moved the submission from which status to which, oldest first. */
export async function submissionHistory(trx: Transaction<Database>, submissionId: string): Promise<HistoryEvent[]> {
  return trx
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
}
