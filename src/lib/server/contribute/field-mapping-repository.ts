import type { Transaction } from 'kysely';
import type { Database } from '../db/schema';

const DEFAULT_MAPPING = 'default';

/** The column choices the firm asked to keep (header → field and unit), as stored. */
export async function findFieldMapping(trx: Transaction<Database>, firmId: string) {
  return trx
    .selectFrom('field_mapping')
    .select('mapping')
    .where('firm_id', '=', firmId)
    .where('name', '=', DEFAULT_MAPPING)
    .executeTakeFirst();
}

/** Keeps the firm's column choices, replacing the earlier ones. */
export async function upsertFieldMapping(trx: Transaction<Database>, firmId: string, mappingJson: string): Promise<void> {
  await trx
    .insertInto('field_mapping')
    .values({ firm_id: firmId, name: DEFAULT_MAPPING, mapping: mappingJson })
    .onConflict((oc) => oc.columns(['firm_id', 'name']).doUpdateSet({ mapping: mappingJson, updated_at: new Date() }))
    .execute();
}
