import type { Ags4Record } from './ags4-parse';
import { type AgsValues, specimenKey } from './ags4-values';
import type { RawIncrement } from './raw-row';

/**
 * The CONS increments of each test, by specimen key, in file order. CONS rows whose key matches no
 * CONG record are skipped with a notice.
 */
export function incrementsBySpecimen(
  records: readonly AgsValues[],
  congRows: readonly Ags4Record[],
  notices: string[],
): Map<string, { increment: RawIncrement; values: AgsValues }[]> {
  const tests = new Set(congRows.map((r) => specimenKey(r.values)));
  const out = new Map<string, { increment: RawIncrement; values: AgsValues }[]>();
  const orphans: number[] = [];
  for (const v of records) {
    const key = specimenKey(v.record.values);
    if (!tests.has(key)) {
      orphans.push(v.record.line);
      continue;
    }
    const increment: RawIncrement = {
      incrementNo: v.number('CONS_INCN'),
      appliedStressKpa: v.number('CONS_INCF'),
      voidRatioStart: v.number('CONS_IVR'),
      voidRatioEnd: v.number('CONS_INCE'),
      mvM2PerMn: v.number('CONS_INMV'),
      cvRootTimeM2PerYear: v.number('CONS_CVRT'),
      cvLogTimeM2PerYear: v.number('CONS_CVLG'),
      cAlpha: v.number('CONS_INSC'),
    };
    out.set(key, [...(out.get(key) ?? []), { increment, values: v }]);
  }
  if (orphans.length > 0) {
    const lines = orphans.slice(0, 5).join(', ') + (orphans.length > 5 ? ', …' : '');
    notices.push(
      `Group CONS: ${orphans.length} row${orphans.length === 1 ? '' : 's'} (line ${lines}) match no CONG test and ${orphans.length === 1 ? 'was' : 'were'} skipped.`,
    );
  }
  return out;
}
