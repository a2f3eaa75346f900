import { describe, expect, it } from 'vitest';
import { applyEdits } from '../../../src/lib/import/edit-rows';
import { formatRowError } from '../../../src/lib/import/errors';
import type { RawRow } from '../../../src/lib/import/raw-row';
import { duplicateKey } from '../../../src/lib/import/row-key';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { fixture, importCsv, VOCABULARY } from '../../fixtures/import/pipeline';

const row = (n: number, values: RawRow['values'], extra: Partial<RawRow> = {}): RawRow => ({
  row: n,
  values: {
    boreholeId: 'BH1',
    region: 'Saltreach Estuary',
    geologicalUnit: 'Saltreach Estuarine Clay',
    depthTop: 3,
    depthBottom: 3.45,
    compressionIndex: 0.9,
    ...values,
  },
  ...extra,
});

describe('validating rows', () => {
  it('passes the good fixture whole, resolving names written in any case', () => {
    const result = importCsv(fixture('good.csv'));
    expect(result.errors).toEqual([]);
    expect(result.valid.map((v) => [v.row, v.record.regionId, v.record.geologicalUnitId, v.record.uscsSymbol])).toEqual([
      [2, 'region-se', 'unit-sec', 'CH'],
      [3, 'region-se', 'unit-sec', 'CH'],
      [4, 'region-se', 'unit-sec', 'Pt'],
      [5, 'region-ou', 'unit-ogc', 'CL'],
    ]);
    expect(result.valid[0]?.record).toMatchObject({
      plasticityIndexPct: 53,
      overconsolidationRatio: 48 / 31,
      sampleQualityClass: 1,
    });
  });

  it('reports a duplicate within the file on the later row, naming the earlier', () => {
    const result = importCsv(fixture('duplicates.csv'));
    expect(result.valid.map((v) => v.row)).toEqual([2, 3]);
    expect(result.errors).toEqual([
      {
        row: 4,
        field: null,
        message: 'Same borehole, sample and depths as row 2; remove one of the two rows, or correct the ids or depths.',
      },
    ]);
  });

  it('reports a test already in the bank from an earlier upload', () => {
    const existingKeys = new Set([duplicateKey({ boreholeId: 'QF-BH-01 ', sampleId: 'U4', depthTop: 6, depthBottom: 6.45 })]);
    const result = importCsv(fixture('good.csv'), { existingKeys });
    expect(result.errors).toEqual([
      { row: 3, field: null, message: expect.stringContaining('already in the bank from an earlier upload') },
    ]);
  });

  it('treats ids without regard to case and depths to the millimetre', () => {
    expect(duplicateKey({ boreholeId: ' BH 1', sampleId: null, depthTop: 1.0004, depthBottom: 2 })).toBe(
      duplicateKey({ boreholeId: 'bh  1', sampleId: '', depthTop: 1, depthBottom: 2.0001 }),
    );
  });

  it('reports reading problems once, without repeating them for the same field', () => {
    const result = validateRows(
      [
        row(
          7,
          { depthTop: undefined },
          { problems: [{ row: 7, field: 'depthTop', message: 'Depth top: "abc" is not a number; …' }] },
        ),
      ],
      VOCABULARY,
    );
    expect(result).toEqual({
      valid: [],
      errors: [{ row: 7, field: 'depthTop', message: 'Depth top: "abc" is not a number; …' }],
    });
  });

  it('lists every problem of a row, not only the first, in column-catalogue order', () => {
    const result = validateRows(
      [row(2, { liquidLimitPct: 900, initialVoidRatio: 0.05, region: 'Nowhere', uscsSymbol: 'XX' })],
      VOCABULARY,
    );
    expect(result.errors.map((e) => e.field)).toEqual(['region', 'uscsSymbol', 'liquidLimitPct', 'initialVoidRatio']);
  });

  it('never throws on strange input', () => {
    const strange = [
      null,
      42,
      'text',
      [],
      { row: 'x' },
      { values: null },
      { values: [] },
      { values: { depthTop: {} } },
      { problems: 'no' },
    ];
    const result = validateRows(strange as unknown as RawRow[], VOCABULARY);
    expect(result.valid).toEqual([]);
    expect(result.errors.length).toBeGreaterThanOrEqual(strange.length);
    expect(result.errors[0]?.row).toBe(2);
    expect(validateRows(null as unknown as RawRow[], VOCABULARY)).toEqual({ valid: [], errors: [] });
  });
});

describe('editing rows that did not come from a CSV', () => {
  it('replaces values in SI units and clears the problem of the edited field', () => {
    const rows: RawRow[] = [
      row(80, { geologicalUnit: 'SEC' }, { problems: [{ row: 80, field: 'geologicalUnit', message: 'unknown' }] }),
      row(81, {}),
    ];
    const edited = applyEdits(rows, { 80: { geologicalUnit: ' Saltreach Estuarine Clay ', depthTop: '3.1', nonsense: 'x' } });
    expect(edited[0]).toEqual({
      row: 80,
      values: { ...rows[0]?.values, geologicalUnit: 'Saltreach Estuarine Clay', depthTop: 3.1 },
    });
    expect(edited[1]).toBe(rows[1]);
    expect(validateRows(edited, VOCABULARY).errors).toEqual([]);
  });

  it('records an edit that is not a number as a problem', () => {
    const [edited] = applyEdits([row(5, {})], { 5: { compressionIndex: 'high' } });
    expect(edited?.values.compressionIndex).toBeUndefined();
    expect(edited?.problems).toEqual([
      { row: 5, field: 'compressionIndex', message: expect.stringContaining('Cc: "high" is not a number') },
    ]);
  });

  it('formats a row error for people', () => {
    expect(formatRowError({ row: 14, field: null, message: 'a quote is opened but never closed.' })).toBe(
      'Row 14: a quote is opened but never closed.',
    );
    expect(formatRowError({ row: 3, field: 'liquidLimitPct', message: 'LL is 900 %.' })).toBe('Row 3, LL: LL is 900 %.');
  });
});
