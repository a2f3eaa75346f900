import { z } from 'zod';

/**
 * Bank-wide settings a platform admin may change, stored in the `app_setting` table (one row per key,
 * the value as JSON). Each key has one schema here, read by the admin form, its endpoint and every
 * service that obeys the setting; a missing row means the default.
 */

/**
 * When figures pooled across firms may be shown: at least `minTests` tests from at least `minFirms` firms,
 * and no one firm contributing more than `maxFirmSharePct` % of them (a k-anonymity threshold with a
 * dominance rule).
 */
export const disclosureRuleSchema = z.strictObject({
  minTests: z.number().int('Whole tests only.').min(3, 'At least 3 tests.').max(100, 'At most 100 tests.'),
  minFirms: z.number().int('Whole firms only.').min(2, 'At least 2 firms.').max(10, 'At most 10 firms.'),
  maxFirmSharePct: z
    .number()
    .min(50, 'A firm share limit below 50 % cannot be met by two firms.')
    .max(95, 'A firm share limit above 95 % lets one firm’s tests be read back from the pool.'),
});
export type DisclosureRuleSetting = z.infer<typeof disclosureRuleSchema>;

export const DEFAULT_DISCLOSURE_RULE: DisclosureRuleSetting = { minTests: 5, minFirms: 2, maxFirmSharePct: 75 };

/** Every setting: its key in `app_setting`, schema and default. */
export const APP_SETTINGS = {
  disclosure_rule: { schema: disclosureRuleSchema, defaultValue: DEFAULT_DISCLOSURE_RULE },
} as const;

export type AppSettingKey = keyof typeof APP_SETTINGS;
