import { describe, expect, it } from 'vitest';
import { autoMapColumns, mappingToRemember } from '../../../src/lib/import/column-match';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { normaliseName } from '../../../src/lib/import/header-text';
import { SYNONYM_COLLISIONS } from '../../../src/lib/import/synonym-index';
import { templateHeader } from '../../../src/lib/import/template';

describe('matching columns to fields', () => {
  it('no two fields answer to the same name', () => {
    expect(SYNONYM_COLLISIONS).toEqual([]);
  });

  it.each([
    ['Depth top (ft)', 'depthTop', 'ft'],
    ['DEPTH_TOP [m]', 'depthTop', 'm'],
    ['Depth bottom m', 'depthBottom', 'm'],
    ["σ'p [kPa]", 'preconsolidationStress', 'kPa'],
    ['Sigma p (psf)', 'preconsolidationStress', 'psf'],
    ['pc (tsf)', 'preconsolidationStress', 'tsf'],
    ['σ′v0 (kPa)', 'verticalEffectiveStress', 'kPa'],
    ['cv (NC range) (ft²/day)', 'cvNc', 'ft2/day'],
    ['cv (OC range) (cm2/s)', 'cvOc', 'cm2/s'],
    ['cv', 'cvNc', 'm2/yr'],
    ['Cα', 'secondaryCompressionIndex', null],
    ['C alpha', 'secondaryCompressionIndex', null],
    ['Δe/e0', 'deltaEOverE0', null],
    ['delta e / e0', 'deltaEOverE0', null],
    ['Unit weight (pcf)', 'bulkUnitWeight', 'pcf'],
    ['mv (m2/kN)', 'mv', 'm2/kN'],
    ['k (cm/s)', 'permeability', 'cm/s'],
    ['Liquid Limit (%)', 'liquidLimitPct', null],
    ['LOCA_ID', 'boreholeId', null],
    ['e₀', 'initialVoidRatio', null],
    ['Borehole / location id', 'boreholeId', null],
  ])('%j → %s in %s', (header, field, unit) => {
    const { columns } = autoMapColumns([header]);
    expect(columns[0]).toMatchObject({ field, unit, source: 'header', note: null });
  });

  it('leaves unknown columns unmatched and lists required fields no column covers', () => {
    const result = autoMapColumns(['Borehole', 'Lab reference', 'Cc']);
    expect(result.mapping).toEqual(['boreholeId', null, 'compressionIndex']);
    expect(result.missingRequired).toEqual(['region', 'geologicalUnit', 'depthTop', 'depthBottom']);
  });

  it('never gives one field to two columns; the later one is left out with a note', () => {
    const { columns, mapping } = autoMapColumns(['LL', 'Liquid limit (%)', 'wL']);
    expect(mapping).toEqual(['liquidLimitPct', null, null]);
    expect(columns[1]?.note).toContain('already matched to column 1 (A)');
  });

  it('notes a bracketed unit that does not fit the field', () => {
    const { columns } = autoMapColumns(['Depth top (kPa)']);
    expect(columns[0]).toMatchObject({ field: 'depthTop', unit: 'm' });
    expect(columns[0]?.note).toContain('"kPa", which is not a unit for Depth top');
  });

  it('lets the firm’s remembered choices win, including "not imported" and the unit', () => {
    const remembered = {
      'pc (lab)': { field: 'preconsolidationStress', unit: 'psf' },
      cc: { field: null },
      'hole no.': { field: 'boreholeId' },
      'cv nc': { field: 'cvOc', unit: 'not-a-unit' },
    };
    const { columns } = autoMapColumns(['Pc (lab)', 'Cc', 'Hole No.', 'cv NC', 'cv'], remembered);
    expect(columns.map((c) => [c.field, c.unit, c.source])).toEqual([
      ['preconsolidationStress', 'psf', 'remembered'],
      [null, null, 'remembered'],
      ['boreholeId', null, 'remembered'],
      ['cvOc', 'm2/yr', 'remembered'],
      ['cvNc', 'm2/yr', 'header'],
    ]);
  });

  it('a remembered field beats a header match for the same field', () => {
    const { mapping, columns } = autoMapColumns(['cv', 'cv lab NC'], { 'cv lab nc': { field: 'cvNc', unit: 'm2/yr' } });
    expect(mapping).toEqual([null, 'cvNc']);
    expect(columns[0]?.note).toContain('already matched to column 2 (B)');
  });

  it('remembers choices under the keys it looks them up by', () => {
    const headers = ['  Depth  TOP (ft)', 'Notes'];
    const first = autoMapColumns(headers);
    const remembered = mappingToRemember(headers, first.mapping, first.units);
    expect(remembered).toEqual({ 'depth top (ft)': { field: 'depthTop', unit: 'ft' }, notes: { field: 'notes', unit: null } });
    expect(autoMapColumns(headers, remembered).columns.map((c) => c.source)).toEqual(['remembered', 'remembered']);
  });

  it('matches every template header back to its own field, in SI', () => {
    const headers = IMPORT_FIELDS.map(templateHeader);
    const { mapping, units, missingRequired } = autoMapColumns(headers);
    expect(mapping).toEqual(IMPORT_FIELDS.map((f) => f.key));
    expect(Object.values(units).every((u) => ['m', 'kPa', 'm2/yr', 'kN/m3', 'm2/MN', 'm/s'].includes(u ?? ''))).toBe(true);
    expect(missingRequired).toEqual([]);
  });

  it('normalises Greek, primes, sub- and superscripts and punctuation', () => {
    expect(normaliseName("σ'p")).toBe('sigmap');
    expect(normaliseName('Sigma P')).toBe('sigmap');
    expect(normaliseName('Cα')).toBe('calpha');
    expect(normaliseName('Δe/e₀')).toBe('deltaee0');
    expect(normaliseName('m²/yr')).toBe('m2yr');
  });
});
