import type { Transaction } from 'kysely';
import type { AppSettingKey } from '../../schemas/app-settings';
import type { Database } from '../db/schema';

/** The stored value of one bank-wide setting and when it was last changed, or undefined when never set. */
export async function findSetting(trx: Transaction<Database>, key: AppSettingKey) {
  return trx.selectFrom('app_setting').select(['value', 'updated_at as updatedAt']).where('key', '=', key).executeTakeFirst();
}

/** Stores one bank-wide setting (insert or replace). */
export async function upsertSetting(trx: Transaction<Database>, key: AppSettingKey, value: unknown): Promise<void> {
  const text = JSON.stringify(value);
  await trx
    .insertInto('app_setting')
    .values({ key, value: text, updated_at: new Date() })
    .onConflict((oc) => oc.column('key').doUpdateSet({ value: text, updated_at: new Date() }))
    .execute();
}
