import { describe, expect, it } from 'vitest';
import { autoMapColumns } from '../../../src/lib/import/column-match';
import { MAX_FILE_BYTES } from '../../../src/lib/import/limits';
import { mapRows } from '../../../src/lib/import/map-rows';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { KPA_PER_PSF } from '../../../src/lib/import/units';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { importErrorStatus } from '../../../src/lib/server/http/error-mapper';
import { fixture, importCsv, VOCABULARY } from '../../fixtures/import/pipeline';

// One test per kind of file the README's upload rules name; each checks the outcome and a key phrase of the message.
describe('the files an upload must handle', () => {
  it('good CSV: every row valid', () => {
    const result = importCsv(fixture('good.csv'));
    expect(result.errors).toEqual([]);
    expect(result.valid).toHaveLength(4);
  });

  it('BOM, semicolons and decimal commas: every row valid, numbers read', () => {
    const result = importCsv(fixture('bom-semicolon-decimal-comma.csv'));
    expect(result.errors).toEqual([]);
    expect(result.valid.map((v) => [v.row, v.record.initialVoidRatio, v.record.compressionIndex])).toEqual([
      [2, 3.65, 1.42],
      [3, 3.2, 1.25],
      [5, 3.4, 1.31],
    ]);
  });

  it('tabs inside quoted cells: read as commas, cells kept whole', () => {
    const result = importCsv(fixture('tabs-in-quoted-cells.csv'));
    expect(result.table.delimiter).toBe(',');
    expect(result.errors).toEqual([]);
    expect(result.valid[0]?.record.notes).toBe('col A\tcol B\ttabs inside');
  });

  it('unbalanced quotes: a row error on the row that opens the quote', () => {
    const result = importCsv(fixture('unbalanced-quotes.csv'));
    expect(result.valid.map((v) => v.row)).toEqual([2, 3]);
    expect(result.errors).toEqual([
      { row: 4, field: null, message: expect.stringContaining('a quote is opened but never closed') },
    ]);
  });

  it.each([
    ['header-only.csv', 'NO_ROWS', 'header row but no data rows', 422],
    ['empty.csv', 'EMPTY_FILE', 'The file is empty.', 422],
  ])('%s: %s', (name, code, phrase, status) => {
    const result = parseCsv(fixture(name));
    expect(result).toMatchObject({ ok: false, error: { code, message: expect.stringContaining(phrase) } });
    if (!result.ok) expect(importErrorStatus(result.error.code)).toBe(status);
  });

  it('wrong units (psf under a kPa header): caught by the σ′p range and the σ′v0-by-depth check', () => {
    const result = importCsv(fixture('wrong-units-psf-as-kpa.csv'));
    expect(result.valid).toEqual([]);
    expect(result.errors.map((e) => [e.row, e.field])).toEqual([
      [2, 'preconsolidationStress'],
      [2, 'verticalEffectiveStress'],
      [3, 'preconsolidationStress'],
      [3, 'verticalEffectiveStress'],
    ]);
    expect(result.errors[0]?.message).toContain('If the column is in psf or tsf, choose that unit.');
  });

  it('wrong units, put right: choosing psf gives valid rows (a stiff, overconsolidated clay)', () => {
    const parsed = parseCsv(fixture('wrong-units-psf-as-kpa.csv'));
    if (!parsed.ok) throw new Error(parsed.error.message);
    const { mapping } = autoMapColumns(parsed.table.headers);
    const mapped = mapRows(parsed.table, mapping, { preconsolidationStress: 'psf', verticalEffectiveStress: 'psf' });
    if (!mapped.ok) throw new Error(mapped.error.message);
    const result = validateRows(mapped.rows, VOCABULARY);
    expect(result.errors).toEqual([]);
    expect(result.valid[0]?.record.preconsolidationStress).toBeCloseTo(12_500 * KPA_PER_PSF, 9);
    expect(result.valid[0]?.record.overconsolidationRatio).toBeCloseTo(12_500 / 1580, 9);
  });

  it('out-of-range values: LL 900, e0 0.05, Cr > Cc, bottom above top', () => {
    const result = importCsv(fixture('out-of-range.csv'));
    expect(result.valid).toEqual([]);
    expect(result.errors).toEqual([
      {
        row: 2,
        field: 'liquidLimitPct',
        message: expect.stringContaining('LL is 900 %, outside the range Claybank accepts (10 to 500 %)'),
      },
      {
        row: 3,
        field: 'initialVoidRatio',
        message: expect.stringContaining('e0 is 0.05, outside the range Claybank accepts (0.2 to 15)'),
      },
      { row: 4, field: 'recompressionIndex', message: expect.stringContaining('Cr (0.9) is not less than Cc (0.7)') },
      { row: 5, field: 'depthBottom', message: expect.stringContaining('Depth bottom (8 m) is not below depth top (8.45 m)') },
    ]);
  });

  it('duplicates within the file: the later row names the earlier', () => {
    const result = importCsv(fixture('duplicates.csv'));
    expect(result.errors).toEqual([
      { row: 4, field: null, message: expect.stringContaining('Same borehole, sample and depths as row 2') },
    ]);
  });

  it('a binary file named .csv: refused as binary', () => {
    const bytes = new Uint8Array([
      0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52,
    ]);
    expect(parseCsv(bytes)).toMatchObject({
      ok: false,
      error: { code: 'BINARY_FILE', message: expect.stringContaining('binary data') },
    });
  });

  it('an oversized file: TOO_LARGE (413) before any parsing', () => {
    const started = performance.now();
    const result = parseCsv(new Uint8Array(MAX_FILE_BYTES + 1));
    expect(performance.now() - started).toBeLessThan(1000);
    expect(result).toMatchObject({
      ok: false,
      error: { code: 'TOO_LARGE', message: expect.stringContaining('the largest file Claybank reads is 20.0 MB') },
    });
    if (!result.ok) expect(importErrorStatus(result.error.code)).toBe(413);
  });
});
