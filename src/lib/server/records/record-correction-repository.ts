import type { Transaction } from 'kysely';
import type { ImportFlag } from '../../contracts/records';
import type { PrivateValues, SharedValues } from '../contribute/record-to-store';
import type { Database } from '../db/schema';

/** A record of a submission with every stored column (shared and private) and its region and unit names. */
export async function findStoredRecord(trx: Transaction<Database>, submissionId: string, recordId: string) {
  return trx
    .selectFrom('test_record as r')
    .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
    .innerJoin('region', 'region.id', 'r.region_id')
    .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
    .selectAll('r')
    .selectAll('p')
    .select(['region.name as regionName', 'unit.name as unitName'])
    .where('r.id', '=', recordId)
    .where('r.submission_id', '=', submissionId)
    .executeTakeFirst();
}

export async function updateSharedValues(
  trx: Transaction<Database>,
  recordId: string,
  shared: SharedValues,
  flags: readonly ImportFlag[],
): Promise<void> {
  await trx
    .updateTable('test_record')
    .set({ ...shared, import_flags: JSON.stringify(flags), updated_at: new Date() })
    .where('id', '=', recordId)
    .execute();
}

export async function updatePrivateValues(trx: Transaction<Database>, recordId: string, values: PrivateValues): Promise<void> {
  await trx
    .updateTable('test_record_private')
    .set({ ...values, updated_at: new Date() })
    .where('test_record_id', '=', recordId)
    .execute();
}
