import { type ExpressionBuilder, sql, type Transaction } from 'kysely';
import type { PrivateRecord, SharedRecord, StressLevel } from '../../contracts/records';
import type { Database } from '../db/schema';
import { PRIVATE_RECORD_COLUMNS, SHARED_RECORD_COLUMNS } from './record-columns';

/** Records with their region and geological unit joined (the shared view's names). */
function recordsWithNames(trx: Transaction<Database>) {
  return trx
    .selectFrom('test_record as r')
    .innerJoin('region', 'region.id', 'r.region_id')
    .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id');
}

/** Published records, and every record of `firmId` when given. */
function visibleTo(firmId: string | null) {
  return (eb: ExpressionBuilder<Database & { r: Database['test_record'] }, 'r'>) =>
    firmId ? eb.or([eb('r.status', '=', 'published'), eb('r.firm_id', '=', firmId)]) : eb('r.status', '=', 'published');
}

export async function countVisibleRecords(trx: Transaction<Database>, firmId: string | null): Promise<number> {
  const { total } = await trx
    .selectFrom('test_record as r')
    .where(visibleTo(firmId))
    .select((eb) => eb.fn.countAll<number>().as('total'))
    .executeTakeFirstOrThrow();
  return total;
}

/** One page of the visible records, by geological unit and depth. */
export async function listVisibleRecords(
  trx: Transaction<Database>,
  firmId: string | null,
  page: { limit: number; offset: number },
): Promise<(SharedRecord & { firmId: string })[]> {
  return recordsWithNames(trx)
    .where(visibleTo(firmId))
    .select([...SHARED_RECORD_COLUMNS, 'r.firm_id as firmId'])
    .orderBy('unit.name')
    .orderBy('r.depth_top_m')
    .orderBy('r.id')
    .limit(page.limit)
    .offset(page.offset)
    .execute();
}

/** A record's shared values and owning firm, whatever its status (the caller decides who may see it). */
export async function findSharedRecord(
  trx: Transaction<Database>,
  recordId: string,
): Promise<(SharedRecord & { firmId: string }) | undefined> {
  return recordsWithNames(trx)
    .select([...SHARED_RECORD_COLUMNS, 'r.firm_id as firmId'])
    .where('r.id', '=', recordId)
    .executeTakeFirst();
}

export async function stressLevelsOf(trx: Transaction<Database>, recordId: string): Promise<StressLevel[]> {
  return trx
    .selectFrom('test_record_stress_level')
    .select([
      'stress_from_kpa as stressFromKpa',
      'stress_to_kpa as stressToKpa',
      'stress_range as stressRange',
      'cv_m2_per_year as cvM2PerYear',
      'secondary_compression_index as secondaryCompressionIndex',
      'mv_m2_per_mn as mvM2PerMn',
      'permeability_m_per_s as permeabilityMPerS',
      'cv_method as cvMethod',
    ])
    .where('test_record_id', '=', recordId)
    .orderBy('stress_from_kpa')
    .execute();
}

export async function findPrivateRecord(trx: Transaction<Database>, recordId: string): Promise<PrivateRecord | undefined> {
  return trx
    .selectFrom('test_record_private as p')
    .select(PRIVATE_RECORD_COLUMNS)
    .where('p.test_record_id', '=', recordId)
    .executeTakeFirst();
}

/** Where a record came from in its file, and what the review said about it. */
const REVIEW_NOTE_COLUMNS = [
  'r.row_number as rowNumber',
  'r.review_comment as reviewComment',
  'r.import_flags as importFlags',
] as const;

/** Every record of a submission, shared and private values with the review notes, in file order. */
export async function ownRecordsOf(trx: Transaction<Database>, submissionId: string) {
  return recordsWithNames(trx)
    .leftJoin('test_record_private as p', 'p.test_record_id', 'r.id')
    .select([...SHARED_RECORD_COLUMNS, ...PRIVATE_RECORD_COLUMNS, ...REVIEW_NOTE_COLUMNS])
    .where('r.submission_id', '=', submissionId)
    .orderBy('r.row_number')
    .execute();
}

/** Every record of a submission, shared values only (what a steward sees), in file order. */
export async function sharedRecordsOf(trx: Transaction<Database>, submissionId: string) {
  return recordsWithNames(trx)
    .select([...SHARED_RECORD_COLUMNS, 'r.geological_unit_id as unitId', ...REVIEW_NOTE_COLUMNS])
    .where('r.submission_id', '=', submissionId)
    .orderBy('r.row_number')
    .execute();
}

/** The records of a submission still waiting for a decision, with their file rows. */
export async function pendingRecordsOf(trx: Transaction<Database>, submissionId: string) {
  return trx
    .selectFrom('test_record')
    .select(['id', 'row_number as rowNumber'])
    .where('submission_id', '=', submissionId)
    .where('status', '=', 'pending')
    .execute();
}

export async function countFlaggedRecords(trx: Transaction<Database>, submissionId: string): Promise<number> {
  const { n } = await trx
    .selectFrom('test_record')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('submission_id', '=', submissionId)
    .where(sql<boolean>`jsonb_array_length(import_flags) > 0`)
    .executeTakeFirstOrThrow();
  return n;
}

/**
 * The duplicate-check identity (borehole, sample, depths) of the firm's live records (not rejected or
 * withdrawn), leaving out one record when it is the one being corrected.
 */
export async function liveRecordKeysOfFirm(trx: Transaction<Database>, firmId: string, exceptRecordId?: string) {
  let query = trx
    .selectFrom('test_record as r')
    .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
    .select([
      'p.borehole_id as boreholeId',
      'p.sample_id as sampleId',
      'r.depth_top_m as depthTop',
      'r.depth_bottom_m as depthBottom',
    ])
    .where('r.firm_id', '=', firmId)
    .where('r.status', 'not in', ['rejected', 'withdrawn']);
  if (exceptRecordId) query = query.where('r.id', '!=', exceptRecordId);
  return query.execute();
}
