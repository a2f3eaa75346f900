import type { Transaction } from 'kysely';
import { APP_SETTINGS, type DisclosureRuleSetting } from '../../schemas/app-settings';
import type { DisclosureRule } from '../../statistics';
import type { Database } from '../db/schema';
import { findSettingValue } from './settings-repository';

/**
 * The bank-wide disclosure rule in the statistics core's terms. A missing row means the default; a
 * stored value that no longer fits the schema (edited by hand) also falls back to the default, with a
 * line in the server log, so that a bad row never opens the pool wider than intended.
 */
export async function readDisclosureRule(trx: Transaction<Database>): Promise<DisclosureRule> {
  const { schema, defaultValue } = APP_SETTINGS.disclosure_rule;
  const stored = await findSettingValue(trx, 'disclosure_rule');
  let setting: DisclosureRuleSetting = defaultValue;
  if (stored !== undefined) {
    const parsed = schema.safeParse(stored);
    if (parsed.success) setting = parsed.data;
    else console.error('[settings] disclosure_rule does not fit its schema; using the default rule.');
  }
  return { minTests: setting.minTests, minFirms: setting.minFirms, maxFirmShare: setting.maxFirmSharePct / 100 };
}
