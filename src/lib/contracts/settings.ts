import type { DisclosureRuleSetting } from '../schemas/app-settings';

export { type DisclosureRuleSetting, disclosureRuleSchema } from '../schemas/app-settings';

/** One bank-wide setting as the admin area shows it. */
export interface SettingState<T> {
  value: T;
  /** true while nothing is stored and the built-in default applies */
  isDefault: boolean;
  defaultValue: T;
  updatedAt: Date | null;
}

/** `GET /api/admin/settings` */
export interface BankSettings {
  disclosureRule: SettingState<DisclosureRuleSetting>;
}
