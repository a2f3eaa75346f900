import { describe, expect, it } from 'vitest';
import { autoMapColumns } from '../../../src/lib/import/column-match';
import type { CsvTable } from '../../../src/lib/import/csv-table';
import { type MapRowsOptions, mapRows, type RowEdits } from '../../../src/lib/import/map-rows';
import { parseCsv } from '../../../src/lib/import/parse-csv';
import { KPA_PER_PSF, M2_PER_YEAR_PER_FT2_PER_DAY } from '../../../src/lib/import/units';
import { fixture } from '../../fixtures/import/pipeline';

function read(input: Uint8Array | string): CsvTable {
  const result = parseCsv(input);
  if (!result.ok) throw new Error(result.error.message);
  return result.table;
}

function mapAll(table: CsvTable, edits?: RowEdits, options?: MapRowsOptions) {
  const { mapping, units } = autoMapColumns(table.headers);
  const result = mapRows(table, mapping, units, edits, options);
  if (!result.ok) throw new Error(result.error.message);
  return result.rows;
}

describe('mapping rows to fields in SI units', () => {
  it('converts each column from its unit to the bank’s unit', () => {
    const table = read("Borehole,Depth top (ft),Depth bottom (ft),σ'p (psf),cv (ft²/day),k (cm/s)\nBH1,10,11.5,1000,1,1e-7\n");
    const [row] = mapAll(table);
    expect(row?.row).toBe(2);
    expect(row?.values.boreholeId).toBe('BH1');
    expect(row?.values.depthTop).toBeCloseTo(3.048, 12);
    expect(row?.values.depthBottom).toBeCloseTo(3.5052, 12);
    expect(row?.values.preconsolidationStress).toBeCloseTo(1000 * KPA_PER_PSF, 12);
    expect(row?.values.cvNc).toBeCloseTo(M2_PER_YEAR_PER_FT2_PER_DAY, 12);
    expect(row?.values.permeability).toBeCloseTo(1e-9, 20);
  });

  it('accepts decimal commas in a semicolon file', () => {
    const rows = mapAll(read(fixture('bom-semicolon-decimal-comma.csv')));
    expect(rows.map((r) => [r.row, r.values.depthTop, r.values.initialVoidRatio, r.values.cvNc])).toEqual([
      [2, 2.5, 3.65, 0.75],
      [3, 4, 3.2, 0.9],
      [5, 3, 3.4, 1.1],
    ]);
    expect(rows.every((r) => r.problems === undefined)).toBe(true);
  });

  it('refuses a decimal comma in a comma-separated file, naming the field', () => {
    const [row] = mapAll(read('Borehole,Cc\nBH1,"0,85"\n'));
    expect(row?.values.compressionIndex).toBeUndefined();
    expect(row?.problems).toEqual([
      { row: 2, field: 'compressionIndex', message: expect.stringContaining('Cc: "0,85" has a comma') },
    ]);
  });

  it('carries the table’s row errors as problems', () => {
    const rows = mapAll(read(fixture('unbalanced-quotes.csv')));
    expect(rows.find((r) => r.row === 4)?.problems?.[0]?.message).toContain('never closed');
  });

  it('lets edits override cells, in the column’s unit, and fill unmapped fields', () => {
    const table = read('Borehole,Depth top (ft),Cc\nBH1,10,abc\nBH2,20,0.5\n');
    const rows = mapAll(table, { 2: { compressionIndex: '0.42', depthTop: '5', region: 'Saltreach Estuary' } });
    expect(rows[0]?.values).toEqual({
      boreholeId: 'BH1',
      depthTop: 5 * 0.3048,
      compressionIndex: 0.42,
      region: 'Saltreach Estuary',
    });
    expect(rows[0]?.problems).toBeUndefined();
    expect(rows[1]?.values).toEqual({ boreholeId: 'BH2', depthTop: 20 * 0.3048, compressionIndex: 0.5 });
  });

  it('fills blanks from defaults (a region for the whole file)', () => {
    const rows = mapAll(read('Borehole,Region\nBH1,\nBH2,Vennmoor Flats\n'), {}, { defaults: { region: 'Saltreach Estuary' } });
    expect(rows.map((r) => r.values.region)).toEqual(['Saltreach Estuary', 'Vennmoor Flats']);
  });

  it.each([
    [['boreholeId'], {}, 'cover 1 columns but the file has 2'],
    [['boreholeId', 'nonsense'], {}, 'not a field Claybank imports'],
    [['liquidLimitPct', 'liquidLimitPct'], {}, 'chosen for two columns'],
    [['boreholeId', 'depthTop'], { depthTop: 'furlong' }, 'not a unit Claybank converts for Depth top'],
    [['boreholeId', 'liquidLimitPct'], { liquidLimitPct: 'ft' }, 'not a unit Claybank converts for LL'],
  ])('refuses a bad mapping %j %j', (mapping, units, phrase) => {
    const result = mapRows(read('a,b\n1,2\n'), mapping, units);
    expect(result).toMatchObject({ ok: false, error: { code: 'BAD_MAPPING' } });
    if (!result.ok) expect(result.error.message).toContain(phrase);
  });
});
