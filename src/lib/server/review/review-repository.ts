import type { Transaction } from 'kysely';
import type { Increment } from '../../contracts/review';
import type { Database } from '../db/schema';
import { COMPARED } from './compared-values';

/** The compared values of every published record of the given geological units. */
export async function publishedPoolOf(trx: Transaction<Database>, unitIds: readonly string[]) {
  if (unitIds.length === 0) return [];
  return trx
    .selectFrom('test_record')
    .select(['geological_unit_id as unitId', ...COMPARED.map((c) => c.column)])
    .where('status', '=', 'published')
    .where('geological_unit_id', 'in', unitIds)
    .execute();
}

/** The raw load increments of the given records, by record and increment number. */
export async function incrementsOf(
  trx: Transaction<Database>,
  recordIds: readonly string[],
): Promise<(Increment & { recordId: string })[]> {
  if (recordIds.length === 0) return [];
  return trx
    .selectFrom('oedometer_increment')
    .select([
      'test_record_id as recordId',
      'increment_no as incrementNo',
      'applied_stress_kpa as appliedStressKpa',
      'end_void_ratio as endVoidRatio',
      'is_unloading as isUnloading',
    ])
    .where('test_record_id', 'in', recordIds)
    .orderBy('test_record_id')
    .orderBy('increment_no')
    .execute();
}
