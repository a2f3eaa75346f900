import type { Transaction } from 'kysely';
import type { BankSettings, SettingState } from '../../contracts/settings';
import { APP_SETTINGS, type AppSettingKey, type DisclosureRuleSetting } from '../../schemas/app-settings';
import type { DisclosureRule } from '../../statistics';
import type { AppServices } from '../app-services';
import type { ActingPerson } from '../audit/acting-person';
import { auditedBy } from '../audit/audit-log';
import { insertAuditEntry } from '../audit/audit-repository';
import type { Database } from '../db/schema';
import { inTenantTransaction, NO_TENANT } from '../tenancy/tenant-transaction';
import { findSetting, findSettingValue, upsertSetting } from './settings-repository';

type SettingValue<K extends AppSettingKey> = (typeof APP_SETTINGS)[K]['defaultValue'];

/**
 * One setting as stored, or its default when nothing (or something that no longer fits the schema) is
 * stored: a bad row never stops the statistics.
 */
export async function settingState<K extends AppSettingKey>(
  trx: Transaction<Database>,
  key: K,
): Promise<SettingState<SettingValue<K>>> {
  const { schema, defaultValue } = APP_SETTINGS[key];
  const row = await findSetting(trx, key);
  const parsed = row ? schema.safeParse(row.value) : null;
  if (!row || !parsed?.success) return { value: defaultValue, isDefault: true, defaultValue, updatedAt: null };
  return { value: parsed.data as SettingValue<K>, isDefault: false, defaultValue, updatedAt: row.updatedAt };
}

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

/** Every bank-wide setting, for the admin area. */
export async function readBankSettings(app: Pick<AppServices, 'db'>): Promise<BankSettings> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => ({
    disclosureRule: await settingState(trx, 'disclosure_rule'),
  }));
}

/** Changes the disclosure rule (already checked against its schema), with the before and after in the audit log. */
export async function updateDisclosureRule(
  app: Pick<AppServices, 'db'>,
  admin: ActingPerson,
  rule: DisclosureRuleSetting,
): Promise<BankSettings> {
  return inTenantTransaction(app.db, NO_TENANT, async (trx) => {
    const before = await settingState(trx, 'disclosure_rule');
    await upsertSetting(trx, 'disclosure_rule', rule);
    await insertAuditEntry(trx, {
      ...auditedBy(admin),
      firmId: null,
      action: 'settings.disclosure_rule_changed',
      objectType: 'setting',
      objectId: 'disclosure_rule',
      summary: { before: before.value, after: rule },
    });
    return { disclosureRule: await settingState(trx, 'disclosure_rule') };
  });
}
