import { sql, type Transaction } from 'kysely';
import type { TestRecordStatus } from '../../contracts/records';
import { type IncrementToStore, PRIVATE_COLUMNS, type RecordToStore, SHARED_COLUMNS } from '../contribute/record-to-store';
import { bulkInsert } from '../db/bulk-insert';
import type { Database } from '../db/schema';

/** The shared part of each record, under the given ids (one id per record, same order). */
export async function insertSharedRecords(
  trx: Transaction<Database>,
  owner: { submissionId: string; firmId: string },
  records: readonly RecordToStore[],
  ids: readonly string[],
): Promise<void> {
  await bulkInsert(
    trx,
    'test_record',
    [
      { name: 'id', type: 'uuid' },
      { name: 'submission_id', type: 'uuid' },
      { name: 'firm_id', type: 'text' },
      { name: 'row_number', type: 'integer' },
      { name: 'import_flags', type: 'jsonb' },
      ...SHARED_COLUMNS,
    ],
    records.map((record, i) => [
      ids[i],
      owner.submissionId,
      owner.firmId,
      record.rowNumber,
      JSON.stringify(record.flags),
      ...SHARED_COLUMNS.map((column) => record.shared[column.name]),
    ]),
  );
}

/** The firm-private part of each record (project, client, borehole, sample, coordinates, notes). */
export async function insertPrivateRecords(
  trx: Transaction<Database>,
  firmId: string,
  records: readonly RecordToStore[],
  ids: readonly string[],
): Promise<void> {
  await bulkInsert(
    trx,
    'test_record_private',
    [{ name: 'test_record_id', type: 'uuid' }, { name: 'firm_id', type: 'text' }, ...PRIVATE_COLUMNS],
    records.map((record, i) => [ids[i], firmId, ...PRIVATE_COLUMNS.map((column) => record.private[column.name])]),
  );
}

/** Raw load increments, each naming its record. */
export async function insertIncrements(
  trx: Transaction<Database>,
  increments: readonly (IncrementToStore & { recordId: string })[],
): Promise<void> {
  await bulkInsert(
    trx,
    'oedometer_increment',
    [
      { name: 'test_record_id', type: 'uuid' },
      { name: 'increment_no', type: 'integer' },
      { name: 'applied_stress_kpa', type: 'numeric' },
      { name: 'is_unloading', type: 'boolean' },
      { name: 'duration_hours', type: 'numeric' },
      { name: 'end_deformation_mm', type: 'numeric' },
      { name: 'end_void_ratio', type: 'numeric' },
      { name: 'specimen_height_mm', type: 'numeric' },
    ],
    increments.map((inc) => [
      inc.recordId,
      inc.incrementNo,
      inc.appliedStressKpa,
      inc.isUnloading,
      inc.durationHours,
      inc.endDeformationMm,
      inc.endVoidRatio,
      inc.specimenHeightMm,
    ]),
  );
}

/** Moves a submission's records from any of `from` to `to` (publishing also sets their bank version). */
export async function setRecordStatuses(
  trx: Transaction<Database>,
  submissionId: string,
  from: readonly TestRecordStatus[],
  to: TestRecordStatus,
  bankVersionId?: number,
): Promise<void> {
  await trx
    .updateTable('test_record')
    .set({ status: to, updated_at: new Date(), ...(bankVersionId !== undefined ? { bank_version_id: bankVersionId } : {}) })
    .where('submission_id', '=', submissionId)
    .where('status', 'in', from)
    .execute();
}

/** Returns the commented records with their comments, in one statement however many there are. */
export async function returnRecordsWithComments(
  trx: Transaction<Database>,
  comments: readonly { recordId: string; comment: string }[],
): Promise<void> {
  if (comments.length === 0) return;
  const ids = comments.map((c) => c.recordId);
  const texts = comments.map((c) => c.comment);
  await sql`
    update test_record as r
    set status = 'returned', review_comment = c.comment, updated_at = now()
    from unnest(${ids}::uuid[], ${texts}::text[]) as c(id, comment)
    where r.id = c.id`.execute(trx);
}
