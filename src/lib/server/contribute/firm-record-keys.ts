import type { Transaction } from 'kysely';
import { duplicateKey } from '../../import';
import type { Database } from '../db/schema';
import { liveRecordKeysOfFirm } from '../records/record-repository';

/** The duplicate keys of the firm's tests already in the bank (any status but rejected or withdrawn). */
export async function firmRecordKeys(trx: Transaction<Database>, firmId: string, exceptRecordId?: string): Promise<Set<string>> {
  const rows = await liveRecordKeysOfFirm(trx, firmId, exceptRecordId);
  return new Set(rows.map((row) => duplicateKey({ ...row, boreholeId: row.boreholeId ?? '' })));
}
