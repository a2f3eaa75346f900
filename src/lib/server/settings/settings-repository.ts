import type { Transaction } from 'kysely';
import type { AppSettingKey } from '../../schemas/app-settings';
import type { Database } from '../db/schema';

/** The stored JSON of one bank-wide setting, or undefined when no row exists (the default applies). */
export async function findSettingValue(trx: Transaction<Database>, key: AppSettingKey): Promise<unknown> {
  const row = await trx.selectFrom('app_setting').select('value').where('key', '=', key).executeTakeFirst();
  return row?.value;
}
