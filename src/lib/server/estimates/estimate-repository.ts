import type { Transaction } from 'kysely';
import type { EstimateSummary } from '../../contracts/estimates';
import type { NewEstimate } from '../db/bank-tables';
import type { Database } from '../db/schema';

const SUMMARY_COLUMNS = [
  'id',
  'name',
  'unit_system as unitSystem',
  'bank_version_id as bankVersion',
  'created_at as createdAt',
  'updated_at as updatedAt',
] as const;

/** A firm's saved estimates, most recently changed first. */
export async function listEstimatesOfFirm(trx: Transaction<Database>, firmId: string): Promise<EstimateSummary[]> {
  return trx.selectFrom('estimate').select(SUMMARY_COLUMNS).where('firm_id', '=', firmId).orderBy('updated_at', 'desc').execute();
}

export async function insertEstimate(trx: Transaction<Database>, values: NewEstimate): Promise<EstimateSummary> {
  return trx.insertInto('estimate').values(values).returning(SUMMARY_COLUMNS).executeTakeFirstOrThrow();
}
