/**
 * The threshold rule for figures pooled across firms: enough tests, from enough firms, with no one
 * firm dominating — a frequency (minimum count) rule with an (n, k)-dominance rule counted in tests,
 * as in Hundepool et al. (2012), Statistical Disclosure Control, Wiley, §4.2 (from memory). Below the
 * rule only the viewer's own firm's data are shown. The rule protects against reading a single firm's
 * data off a pooled figure; masking.ts protects a single test against differencing.
 */
import { StatisticsInputError } from './errors';

export interface DisclosureRule {
  /** Fewest tests behind a pooled figure (default 5). */
  minTests: number;
  /** Fewest firms behind a pooled figure (default 2). */
  minFirms: number;
  /** Largest share of the tests one firm may contribute, 0–1 (default 0.75). */
  maxFirmShare: number;
}

export const DEFAULT_DISCLOSURE_RULE: Readonly<DisclosureRule> = { minTests: 5, minFirms: 2, maxFirmShare: 0.75 };

export type DisclosureReasonCode = 'TOO_FEW_TESTS' | 'TOO_FEW_FIRMS' | 'ONE_FIRM_DOMINATES';

export interface DisclosureReason {
  code: DisclosureReasonCode;
  message: string;
}

export interface DisclosureVerdict {
  released: boolean;
  tests: number;
  firms: number;
  /** Share of the tests from the firm contributing most, 0–1 (0 when there are none). */
  largestFirmShare: number;
  reasons: DisclosureReason[];
}

/** A rule with defaults filled in; throws StatisticsInputError for values that make no sense. */
export function disclosureRule(partial: Partial<DisclosureRule> = {}): DisclosureRule {
  const rule = { ...DEFAULT_DISCLOSURE_RULE, ...partial };
  if (!Number.isInteger(rule.minTests) || rule.minTests < 1) {
    throw new StatisticsInputError('The fewest tests behind a pooled figure must be a whole number, 1 or more.');
  }
  if (!Number.isInteger(rule.minFirms) || rule.minFirms < 1) {
    throw new StatisticsInputError('The fewest firms behind a pooled figure must be a whole number, 1 or more.');
  }
  if (!(rule.maxFirmShare > 0 && rule.maxFirmShare <= 1)) {
    throw new StatisticsInputError('The largest share one firm may contribute must be above 0 and at most 1 (100 %).');
  }
  return rule;
}

const percent = (share: number) => `${Math.round(share * 100)} %`;
const tests = (n: number) => (n === 1 ? '1 test' : `${n} tests`);

/** Applies the rule to the number of tests each firm contributes (zeros allowed). */
export function checkDisclosure(testsPerFirm: ArrayLike<number>, rule: DisclosureRule): DisclosureVerdict {
  let total = 0;
  let firms = 0;
  let largest = 0;
  for (let i = 0; i < testsPerFirm.length; i++) {
    const count = testsPerFirm[i] as number;
    if (count <= 0) continue;
    total += count;
    firms++;
    if (count > largest) largest = count;
  }
  const share = total > 0 ? largest / total : 0;
  const reasons: DisclosureReason[] = [];
  if (total < rule.minTests) {
    reasons.push({
      code: 'TOO_FEW_TESTS',
      message: `Only ${tests(total)} stand behind this figure; figures pooled across firms need at least ${tests(rule.minTests)}.`,
    });
  }
  if (firms < rule.minFirms) {
    reasons.push({
      code: 'TOO_FEW_FIRMS',
      message:
        firms === 0
          ? 'No firm has a test here.'
          : `All ${tests(total)} come from ${firms === 1 ? 'one firm' : `${firms} firms`}; figures pooled across firms need tests from at least ${rule.minFirms} firms.`,
    });
  } else if (share > rule.maxFirmShare) {
    reasons.push({
      code: 'ONE_FIRM_DOMINATES',
      message: `One firm contributed ${largest} of the ${tests(total)} (${percent(share)}); no firm may contribute more than ${percent(rule.maxFirmShare)} of the tests behind a pooled figure.`,
    });
  }
  return { released: reasons.length === 0, tests: total, firms, largestFirmShare: share, reasons };
}
