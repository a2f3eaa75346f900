import type { Transaction } from 'kysely';
import type { Database } from '../db/schema';

/** The newest bank version, or null before the first publication. */
export async function currentBankVersion(trx: Transaction<Database>): Promise<number | null> {
  const row = await trx
    .selectFrom('bank_version')
    .select((eb) => eb.fn.max('id').as('id'))
    .executeTakeFirst();
  return row?.id ?? null;
}

/** A new bank version; returns its number. */
export async function insertBankVersion(
  trx: Transaction<Database>,
  version: { publishedBy: string | null; note: string; recordCount: number },
): Promise<number> {
  const { id } = await trx
    .insertInto('bank_version')
    .values({ published_by: version.publishedBy, note: version.note, record_count: version.recordCount })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

/** Queues records for the search index (the indexer picks them up from the outbox). */
export async function queueSearchUpserts(trx: Transaction<Database>, recordIds: readonly string[]): Promise<void> {
  if (recordIds.length === 0) return;
  await trx
    .insertInto('search_outbox')
    .values(recordIds.map((id) => ({ entity_type: 'test_record', entity_id: id, operation: 'upsert' as const })))
    .execute();
}
