import type { Transaction } from 'kysely';
import type { AppSettingKey } from '../../schemas/app-settings';
import type { Database } from '../db/schema';

/** The stored JSON of one bank-wide setting, or undefined when no row exists (the default applies). */
export async function findSettingValue(trx: Transaction<Database>, key: AppSettingKey): Promise<unknown> {
  const row = await trx.selectFrom('app_setting').select('value').where('key', '=', key).executeTakeFirst();
  return row?.value;
}

/** The stored value of one bank-wide setting with the time it last changed, or undefined when never set. */
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
