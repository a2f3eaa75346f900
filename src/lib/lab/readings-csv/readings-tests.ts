import { shown } from '../outcome';
import type { IncrementInput, TimeReading } from '../test-input';
import type { ReadingsTest } from './read-readings';
import { SPECIMEN_KEYS } from './readings-fields';
import { numberOf, type ReadingsRowError, testKey, type ValuesRow } from './readings-rows';

/** A row error with the test it belongs to, so the whole test can be left out. */
export type KeyedError = ReadingsRowError & { testKey?: string };

/**
 * Groups the increment rows into tests (by the Test cell), checks each test's rows (increment numbers
 * once each, a stress, a deformation or void ratio, one value per specimen column, the height when
 * deformations are given) and hangs each time reading on its test and increment.
 */
export function buildTests(
  incRows: ValuesRow[],
  timeRows: ValuesRow[],
  errors: KeyedError[],
): (ReadingsTest & { rows: number[] })[] {
  const named = incRows.some((r) => testKey(r) !== '');
  const groups = new Map<string, ValuesRow[]>();
  for (const r of incRows) {
    if (named && testKey(r) === '') {
      errors.push({
        row: r.row,
        field: 'testId',
        message: 'Test is blank but other rows name their test; name the test on every row.',
        section: 'increments',
      });
      continue;
    }
    groups.set(testKey(r), [...(groups.get(testKey(r)) ?? []), r]);
  }
  const tests = [...groups.entries()].map(([key, rows]) => buildTest(key, rows, errors));
  const byKey = new Map(tests.map((t) => [t.testId ?? '', t]));
  const seen = new Set<string>();
  for (const r of timeRows) {
    const key = testKey(r);
    const test = byKey.get(key) ?? (key === '' && tests.length === 1 ? tests[0] : undefined);
    const no = numberOf(r, 'incrementNo');
    const inc = test?.increments.find((i) => i.incrementNo === no);
    const fail = (field: string, message: string) =>
      errors.push({ row: r.row, field, message, section: 'time readings', testKey: test?.testId ?? undefined });
    if (!test) {
      fail(
        'testId',
        key === ''
          ? 'name the test this reading belongs to (the file holds several).'
          : `no increment row names the test "${key}".`,
      );
      continue;
    }
    if (!inc) {
      if (no !== null) fail('incrementNo', `the test has no increment ${shown(no)} in the increments table.`);
      continue;
    }
    const t = numberOf(r, 'elapsedMin');
    const d = numberOf(r, 'deformationMm');
    if (t === null || d === null) {
      if (r.unreadable.length === 0)
        fail(
          t === null ? 'elapsedMin' : 'deformationMm',
          `${t === null ? 'Elapsed time' : 'Deformation'} is blank; give both the time and the deformation.`,
        );
      continue;
    }
    const id = `${key}\u0001${no}\u0001${t}`;
    if (seen.has(id)) fail('elapsedMin', `increment ${shown(no ?? 0)} already has a reading at ${shown(t)} min.`);
    seen.add(id);
    (inc.readings as TimeReading[]).push({ elapsedMin: t, deformationMm: d });
  }
  for (const t of tests) for (const inc of t.increments) if (inc.readings?.length === 0) delete inc.readings;
  return tests;
}

function buildTest(key: string, rows: ValuesRow[], errors: KeyedError[]): ReadingsTest & { rows: number[] } {
  const specimen: Record<string, number | null> = {};
  const source: Record<string, number> = {};
  const increments: IncrementInput[] = [];
  const numbers = new Map<number, number>();
  const fail = (row: number, field: string, message: string) =>
    errors.push({ row, field, message, section: 'increments', testKey: key });
  for (const r of rows) {
    for (const k of SPECIMEN_KEYS) {
      const v = numberOf(r, k);
      if (v === null) continue;
      if (specimen[k] === undefined || specimen[k] === null) {
        specimen[k] = v;
        source[k] = r.row;
      } else if (Math.abs((specimen[k] as number) - v) > 1e-9 * Math.max(1, Math.abs(v))) {
        fail(r.row, k, `differs from row ${source[k]} (${shown(specimen[k] as number)}); give one value per test.`);
      }
    }
    const no = numberOf(r, 'incrementNo');
    const stress = numberOf(r, 'stressKpa');
    const deformation = numberOf(r, 'deformationMm');
    const voidRatio = numberOf(r, 'voidRatio');
    const blank = (k: string) => numberOf(r, k) === null && !r.unreadable.includes(k);
    if (no === null) {
      if (blank('incrementNo')) fail(r.row, 'incrementNo', 'Increment is blank; number the increments from 1.');
    } else if (numbers.has(no)) fail(r.row, 'incrementNo', `increment ${shown(no)} is also on row ${numbers.get(no)}.`);
    else numbers.set(no, r.row);
    if (blank('stressKpa')) fail(r.row, 'stressKpa', 'Applied stress is blank.');
    if (blank('deformationMm') && blank('voidRatio'))
      fail(r.row, 'deformationMm', 'give the deformation at the end of the increment, or the void ratio.');
    if (no !== null && stress !== null)
      increments.push({ incrementNo: no, stressKpa: stress, deformationMm: deformation, voidRatio, readings: [] });
  }
  const first = rows[0]?.row ?? 0;
  if (increments.some((i) => i.deformationMm !== null) && specimen.initialHeightMm == null) {
    fail(first, 'initialHeightMm', 'deformations are given, so the initial height of the specimen is needed.');
  }
  const given = (k: (typeof SPECIMEN_KEYS)[number]) => specimen[k] ?? null;
  return {
    testId: key === '' ? null : key,
    firstRow: first,
    specimen: {
      initialHeightMm: given('initialHeightMm'),
      diameterMm: given('diameterMm'),
      waterContentPct: given('waterContentPct'),
      specificGravity: given('specificGravity'),
      dryMassG: given('dryMassG'),
      initialVoidRatio: given('initialVoidRatio'),
    },
    increments,
    rows: rows.map((r) => r.row),
  };
}
