import { describe, expect, it } from 'vitest';
import { splitRow } from '../../../src/lib/import/anonymise';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { columnGuide, templateCsv } from '../../../src/lib/import/template';
import { importCsv } from '../../fixtures/import/pipeline';

describe('the CSV template', () => {
  it('has every field with its SI unit, and starts with a byte-order mark', () => {
    const text = templateCsv();
    expect(text.startsWith('\uFEFFProject name,Client,Borehole / location id,')).toBe(true);
    expect(text).toContain('Depth top (m),Depth bottom (m)');
    expect(text).toContain("σ'p (kPa),σ'v0 (kPa),OCR,cv (NC range) (m²/yr),cv (OC range) (m²/yr),Cα,mv (m²/MN),k (m/s)");
    expect(text).toContain('Bulk unit weight (kN/m³)');
    expect(text.split('\r\n').filter((l) => l !== '')).toHaveLength(2);
  });

  it('imports cleanly through the whole pipeline, as bytes', () => {
    const result = importCsv(new TextEncoder().encode(templateCsv()));
    expect(result.columns.mapping).toEqual(IMPORT_FIELDS.map((f) => f.key));
    expect(result.errors).toEqual([]);
    expect(result.valid).toHaveLength(1);
    const [row] = result.valid;
    expect(row?.record).toMatchObject({
      boreholeId: 'QF-BH-01',
      region: 'Saltreach Estuary',
      geologicalUnit: 'Saltreach Estuarine Clay',
      locationCell: 'E82-N57',
      sampleQualityClass: 1,
    });
    if (row) expect(splitRow(row).flags).toEqual([]);
  });

  it('says the example is invented', () => {
    expect(templateCsv()).toContain('(invented)');
  });

  it('guides every column: required, units offered and where the value goes', () => {
    const guide = columnGuide();
    expect(guide).toHaveLength(IMPORT_FIELDS.length);
    expect(guide.find((g) => g.field === 'depthTop')).toEqual({
      column: 'Depth top (m)',
      field: 'depthTop',
      required: true,
      units: ['m', 'ft'],
      scope: 'shared',
      guide: 'Below ground level; 0 or more.',
    });
    expect(guide.find((g) => g.field === 'cvNc')?.units).toEqual(['m²/yr', 'cm²/s', 'ft²/day', 'm²/s']);
    expect(guide.filter((g) => g.required).map((g) => g.field)).toEqual([
      'boreholeId',
      'region',
      'geologicalUnit',
      'depthTop',
      'depthBottom',
    ]);
    expect(guide.find((g) => g.field === 'notes')?.scope).toBe('private');
  });
});
