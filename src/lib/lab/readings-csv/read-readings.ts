import { decodeText } from '../../import/decode';
import type { ImportError } from '../../import/errors';
import { parseCsv } from '../../import/parse-csv';
import type { IncrementInput, SpecimenInput } from '../test-input';
import { INCREMENT_FIELDS, TIME_READING_FIELDS } from './readings-fields';
import { matchHeaders } from './readings-headers';
import { type ReadingsRowError, rowValues, type ValuesRow } from './readings-rows';
import { splitSections } from './readings-sections';
import { buildTests, type KeyedError } from './readings-tests';

export interface ReadingsTest {
  /** the Test cell, or null when the file holds one unnamed test */
  testId: string | null;
  /** row of the test's first increment */
  firstRow: number;
  specimen: SpecimenInput;
  increments: IncrementInput[];
}

export type ReadingsError = ImportError | { code: 'READINGS_COLUMNS'; message: string };

export type ReadingsResult =
  | { ok: true; tests: ReadingsTest[]; rowErrors: ReadingsRowError[]; notices: string[] }
  | { ok: false; error: ReadingsError };

/**
 * Reads a readings file: the increments table, and the time readings either after a `[time readings]`
 * line in the same file or in a second file. Never throws. File-level problems (the importer's decoding
 * and CSV errors, or READINGS_COLUMNS for a missing column or a unit that cannot be converted) stop the
 * read; row problems are listed with the section and spreadsheet row, and a test with any row problem is
 * left out of `tests` (a caller stores nothing while `rowErrors` is not empty).
 */
export function readReadingsCsv(files: { increments: Uint8Array | string; timeReadings?: Uint8Array | string }): ReadingsResult {
  const decoded = decodeText(files.increments);
  if (!decoded.ok) return decoded;
  let sections = splitSections(decoded.text);
  if (files.timeReadings !== undefined) {
    if (sections.timeReadings)
      return columnsError('The increments file also holds a [time readings] section; send the time readings once, in one place.');
    const second = decodeText(files.timeReadings);
    if (!second.ok) return { ok: false, error: { ...second.error, message: `Time readings file: ${second.error.message}` } };
    sections = { increments: sections.increments, timeReadings: { text: second.text, markerRow: 0 } };
  }
  const incTable = parseCsv(sections.increments);
  if (!incTable.ok) return incTable;
  const incMatch = matchHeaders(incTable.table.headers, INCREMENT_FIELDS, 'Increments');
  if (incMatch.problem) return columnsError(incMatch.problem);
  const rowErrors: KeyedError[] = [];
  const notices = [...incMatch.notices];
  const incRows = rowValues(incTable.table, incMatch, 'increments', 0, rowErrors);
  let timeRows: ValuesRow[] = [];
  if (sections.timeReadings) {
    const timeTable = parseCsv(sections.timeReadings.text);
    if (!timeTable.ok) return { ok: false, error: { ...timeTable.error, message: `Time readings: ${timeTable.error.message}` } };
    const timeMatch = matchHeaders(timeTable.table.headers, TIME_READING_FIELDS, 'Time readings');
    if (timeMatch.problem) return columnsError(timeMatch.problem);
    notices.push(...timeMatch.notices);
    timeRows = rowValues(timeTable.table, timeMatch, 'time readings', sections.timeReadings.markerRow, rowErrors);
  }
  const tests = buildTests(incRows, timeRows, rowErrors);
  const failedRows = new Set(rowErrors.filter((e) => e.section === 'increments').map((e) => e.row));
  const failedTests = new Set(rowErrors.map((e) => e.testKey).filter((k): k is string => k !== undefined));
  return {
    ok: true,
    tests: tests
      .filter((t) => !failedTests.has(t.testId ?? '') && !t.rows.some((r) => failedRows.has(r)))
      .map(({ rows: _rows, ...t }) => t),
    rowErrors: rowErrors.map(({ testKey: _key, ...e }) => e),
    notices,
  };
}

function columnsError(message: string): ReadingsResult {
  return { ok: false, error: { code: 'READINGS_COLUMNS', message } };
}
