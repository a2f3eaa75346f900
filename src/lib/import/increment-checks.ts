import { formatValue as f } from './row-ranges';
import type { IncrementInput, TestRecordIncrement } from './test-record';

interface Limit {
  key: keyof IncrementInput;
  name: string;
  min: number;
  minExclusive?: boolean;
  max: number;
}

// common practice: what an oedometer increment on soil can report
const LIMITS: readonly Limit[] = [
  { key: 'appliedStressKpa', name: 'the applied stress (kPa)', min: 0, max: 100_000 },
  { key: 'voidRatioStart', name: 'the void ratio at the start', min: 0, minExclusive: true, max: 20 },
  { key: 'voidRatioEnd', name: 'the void ratio at the end', min: 0, minExclusive: true, max: 20 },
  { key: 'mvM2PerMn', name: 'mv (m²/MN)', min: 0, max: 100 },
  { key: 'cvRootTimeM2PerYear', name: 'cv by root time (m²/yr)', min: 0, minExclusive: true, max: 100_000 },
  { key: 'cvLogTimeM2PerYear', name: 'cv by log time (m²/yr)', min: 0, minExclusive: true, max: 100_000 },
  { key: 'cAlpha', name: 'Cα', min: 0, max: 1 },
];

/**
 * Checks the consolidation increments of one test (types already checked) and returns them in increment
 * order. Problems are reported on the 'increments' field, naming the increment.
 */
export function checkIncrements(
  list: readonly IncrementInput[],
  add: (field: 'increments', message: string) => void,
): TestRecordIncrement[] {
  const out: TestRecordIncrement[] = [];
  const seen = new Set<number>();
  let failed = false;
  for (const [i, inc] of list.entries()) {
    const n = inc.incrementNo;
    const name = typeof n === 'number' ? `Increment ${f(n)}` : `Increment ${i + 1} in the list`;
    const fail = (message: string) => {
      failed = true;
      add('increments', `${name}: ${message}`);
    };
    if (typeof n !== 'number' || !Number.isInteger(n) || n < 1) fail('the increment number must be a whole number from 1 up.');
    else if (seen.has(n)) fail('this increment number appears twice.');
    else seen.add(n);
    if (inc.appliedStressKpa === null || inc.appliedStressKpa === undefined) fail('the applied stress is missing.');
    for (const limit of LIMITS) {
      const v = inc[limit.key];
      if (v === null || v === undefined) continue;
      const low = limit.minExclusive ? v <= limit.min : v < limit.min;
      if (low || v > limit.max) {
        fail(`${limit.name} is ${f(v)}, outside ${limit.minExclusive ? 'more than ' : ''}${f(limit.min)} to ${f(limit.max)}.`);
      }
    }
    out.push({
      incrementNo: typeof n === 'number' ? n : 0,
      appliedStressKpa: inc.appliedStressKpa ?? 0,
      voidRatioStart: inc.voidRatioStart ?? null,
      voidRatioEnd: inc.voidRatioEnd ?? null,
      mvM2PerMn: inc.mvM2PerMn ?? null,
      cvRootTimeM2PerYear: inc.cvRootTimeM2PerYear ?? null,
      cvLogTimeM2PerYear: inc.cvLogTimeM2PerYear ?? null,
      cAlpha: inc.cAlpha ?? null,
    });
  }
  return failed ? [] : out.sort((a, b) => a.incrementNo - b.incrementNo);
}
