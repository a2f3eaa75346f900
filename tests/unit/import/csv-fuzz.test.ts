import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { autoMapColumns } from '../../../src/lib/import/column-match';
import type { Delimiter } from '../../../src/lib/import/delimiter';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { mapRows } from '../../../src/lib/import/map-rows';
import { type CsvParseResult, parseCsv } from '../../../src/lib/import/parse-csv';
import type { RawRow } from '../../../src/lib/import/raw-row';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { VOCABULARY } from '../../fixtures/import/pipeline';

const RUNS = { seed: 20261202, numRuns: 1000 };
const DELIMITERS: Delimiter[] = [',', ';', '\t'];

/** Characters that stress a CSV reader: every delimiter, quotes, line breaks, spaces, non-ASCII. */
const csvChar = fc.constantFrom(
  'a',
  'B',
  '7',
  '.',
  ' ',
  ',',
  ';',
  '\t',
  '"',
  '\n',
  '\r',
  '\r\n',
  'é',
  'σ',
  '²',
  '中',
  '😀',
  '=',
  "'",
);
const cell = fc.string({ unit: csvChar, maxLength: 8 });

/** The reader's promise: either a file-level error, or a table whose rows fit the header and whose row errors name real rows. */
function expectWellFormed(result: CsvParseResult) {
  if (!result.ok) {
    expect(result.error.code).toMatch(/^[A-Z0-9_]+$/);
    expect(result.error.message.length).toBeGreaterThan(10);
    return;
  }
  const { headers, rows, rowErrors } = result.table;
  expect(rows.length).toBeGreaterThan(0);
  const numbers = new Set(rows.map((r) => r.row));
  for (const row of rows) expect(row.cells).toHaveLength(headers.length);
  for (const error of rowErrors) expect(numbers.has(error.row)).toBe(true);
}

const blank = (row: readonly string[]) => row.join('').trim() === '';

describe('the CSV reader under fuzzing (fixed seed)', () => {
  it('never throws on arbitrary strings', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 300 }), (text) => expectWellFormed(parseCsv(text))),
      RUNS,
    );
  });

  it('never throws on arbitrary CSV-like strings and bytes', () => {
    fc.assert(
      fc.property(
        fc.string({ unit: csvChar, maxLength: 300 }),
        fc.option(fc.constantFrom(...DELIMITERS), { nil: undefined }),
        (text, delimiter) => expectWellFormed(parseCsv(text, { delimiter })),
      ),
      RUNS,
    );
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => expectWellFormed(parseCsv(bytes))),
      RUNS,
    );
  });

  it('never throws on arbitrary tables rendered with each delimiter, read with or without the delimiter given', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(cell, { minLength: 1, maxLength: 5 }), { minLength: 1, maxLength: 8 }),
        fc.constantFrom(...DELIMITERS),
        fc.constantFrom('\r\n', '\n', '\r'),
        fc.boolean(),
        (table, delimiter, newline, given) => {
          const text = Papa.unparse(table, { delimiter, newline });
          const result = parseCsv(text, given ? { delimiter } : {});
          expectWellFormed(result);
          if (result.ok) {
            const mapping = autoMapColumns(result.table.headers);
            const mapped = mapRows(result.table, mapping.mapping, mapping.units);
            expect(mapped.ok).toBe(true);
            if (mapped.ok) validateRows(mapped.rows, VOCABULARY);
          }
        },
      ),
      RUNS,
    );
  });

  it('gives back the table it was given: parse(unparse(table)) = table, blank rows dropped', () => {
    const header = fc.uniqueArray(
      cell.filter((c) => c.trim() !== ''),
      { minLength: 2, maxLength: 5, selector: (c) => c.trim().toLowerCase() },
    );
    const table = header.chain((names) =>
      fc.tuple(
        fc.constant(names),
        fc.array(fc.array(cell, { minLength: names.length, maxLength: names.length }), { minLength: 1, maxLength: 8 }),
      ),
    );
    fc.assert(
      fc.property(
        table,
        fc.constantFrom(...DELIMITERS),
        fc.constantFrom('\r\n', '\n', '\r'),
        ([names, rows], delimiter, newline) => {
          const text = Papa.unparse([names, ...rows], { delimiter, newline });
          const result = parseCsv(text, { delimiter });
          const expected = rows.filter((r) => !blank(r));
          if (expected.length === 0) {
            expect(result).toMatchObject({ ok: false, error: { code: 'NO_ROWS' } });
            return;
          }
          expect(result.ok).toBe(true);
          if (!result.ok) return;
          expect(result.table.headers).toEqual(names);
          expect(result.table.rows.map((r) => r.cells)).toEqual(expected);
          expect(result.table.rowErrors).toEqual([]);
          const rowNumbers = rows.map((r, i) => (blank(r) ? null : i + 2)).filter((n) => n !== null);
          expect(result.table.rows.map((r) => r.row)).toEqual(rowNumbers);
        },
      ),
      RUNS,
    );
  });

  it('the row validator never throws on arbitrary raw rows', () => {
    const key = fc.constantFrom(...IMPORT_FIELDS.map((f) => f.key), 'increments', '__proto__', 'toString');
    const loose = fc.oneof(
      fc.double(),
      fc.integer(),
      fc.string({ maxLength: 8 }),
      fc.constant(null),
      fc.constant(undefined),
      fc.anything({ maxDepth: 2 }),
    );
    const increment = fc.dictionary(
      fc.constantFrom('incrementNo', 'appliedStressKpa', 'voidRatioEnd', 'mvM2PerMn', 'cAlpha', 'x'),
      loose,
    );
    const rawRow = fc.record(
      {
        row: fc.oneof(fc.integer(), fc.anything({ maxDepth: 1 })),
        values: fc.oneof(fc.dictionary(key, loose), fc.anything({ maxDepth: 2 })),
        increments: fc.oneof(fc.array(increment, { maxLength: 3 }), fc.anything({ maxDepth: 2 })),
        problems: fc.oneof(
          fc.array(fc.record({ row: fc.integer(), field: fc.option(key), message: fc.string() })),
          fc.anything({ maxDepth: 2 }),
        ),
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(fc.array(fc.oneof(rawRow, fc.anything({ maxDepth: 2 })), { maxLength: 6 }), (rows) => {
        const result = validateRows(rows as RawRow[], VOCABULARY);
        for (const error of result.errors) {
          expect(typeof error.row).toBe('number');
          expect(typeof error.message).toBe('string');
        }
        expect(result.valid.length + new Set(result.errors.map((e) => e.row)).size).toBeLessThanOrEqual(
          rows.length + result.errors.length,
        );
      }),
      RUNS,
    );
  });
});
