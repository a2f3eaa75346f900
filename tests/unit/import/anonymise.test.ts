import { describe, expect, it } from 'vitest';
import { sharedView, splitRow } from '../../../src/lib/import/anonymise';
import { IMPORT_FIELDS, type ImportFieldSpec } from '../../../src/lib/import/fields';
import { identifyingReasons } from '../../../src/lib/import/identifying-text';
import { locationCellFromCoordinates } from '../../../src/lib/import/location-cell';
import type { ValidRow } from '../../../src/lib/import/validate-rows';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { VOCABULARY } from '../../fixtures/import/pipeline';

function valid(values: Record<string, unknown>): ValidRow {
  const result = validateRows(
    [
      {
        row: 2,
        values: {
          projectName: 'Quayside Relief Road',
          clientName: 'Harbour Board',
          boreholeId: 'QF-BH-01',
          sampleId: 'U4',
          easting: 412_300,
          northing: 286_700,
          coordinateSystem: 'local grid',
          notes: 'call the site office',
          region: 'Saltreach Estuary',
          geologicalUnit: 'Saltreach Estuarine Clay',
          depthTop: 6,
          depthBottom: 6.45,
          compressionIndex: 0.85,
          liquidLimitPct: 82,
          plasticLimitPct: 32,
          ...values,
        },
      },
    ],
    VOCABULARY,
  );
  const [first] = result.valid;
  if (!first) throw new Error(JSON.stringify(result.errors));
  return first;
}

const PRIVATE_KEYS = IMPORT_FIELDS.filter((f) => f.scope === 'private').map((f) => f.key);

describe('splitting a row into what stays private and what is shared', () => {
  it('keeps ids, coordinates and notes private and shares a 5 km cell', () => {
    const { shared, private: own, flags } = splitRow(valid({ samplingMethod: 'piston' }));
    expect(own).toEqual({
      projectName: 'Quayside Relief Road',
      clientName: 'Harbour Board',
      boreholeId: 'QF-BH-01',
      sampleId: 'U4',
      easting: 412_300,
      northing: 286_700,
      latitude: null,
      longitude: null,
      coordinateSystem: 'local grid',
      notes: 'call the site office',
    });
    for (const key of PRIVATE_KEYS) expect(shared).not.toHaveProperty(key);
    expect(JSON.stringify(shared)).not.toMatch(/Quayside|Harbour|QF-BH-01|412300|286700|site office/);
    expect(shared).toMatchObject({
      region: 'Saltreach Estuary',
      locationCell: 'E82-N57',
      depthTop: 6,
      plasticityIndexPct: 50,
      increments: [],
    });
    expect(flags).toEqual([]);
  });

  it('derives the cell as E{floor(e/5000)}-N{floor(n/5000)}, zero-padded', () => {
    expect(locationCellFromCoordinates(412_300, 286_700)).toBe('E82-N57');
    expect(locationCellFromCoordinates(0, 9_999)).toBe('E00-N01');
    expect(locationCellFromCoordinates(49_999_999, 5_000_000)).toBe('E9999-N1000');
    expect(locationCellFromCoordinates(50_000_000, 0)).toBeNull();
    expect(locationCellFromCoordinates(-1, 0)).toBeNull();
  });

  it.each([
    ['piston, from QF-BH-01', 'contains the borehole id'],
    ['U4 tube', null],
    ['Quayside relief road spec', 'contains the project name'],
    ['per Harbour Board spec', 'contains the client name'],
    ['ask jo.bloggs@example.test', 'contains an e-mail address'],
    ['see www.example.test/method', 'contains a web address'],
    ['lab +44 1632 960123', 'contains what looks like a phone number'],
    ['taken at 412300, 286700', 'contains what looks like a pair of coordinates'],
    ['at 51.5074, -0.1278', 'contains what looks like a pair of coordinates'],
    ['ASTM D2435-11 method B, 2024-03-15', null],
    ['BS EN ISO 17892-5:2017', null],
  ])('flags shared text %j', (text, reason) => {
    const { flags } = splitRow(valid({ testStandard: text }));
    if (reason === null) expect(flags).toEqual([]);
    else expect(flags).toContainEqual({ field: 'testStandard', reason: `Test standard ${reason}.` });
  });

  it('never repeats the private value in a flag (a steward reads them)', () => {
    const { flags } = splitRow(valid({ samplingMethod: 'piston at QF-BH-01 for Harbour Board' }));
    expect(flags).toHaveLength(2);
    expect(JSON.stringify(flags)).not.toMatch(/QF-BH-01|Harbour/);
  });

  it('ignores private values shorter than 3 characters', () => {
    expect(identifyingReasons('U4 piston', [{ what: 'the sample id', value: 'U4' }])).toEqual([]);
  });

  it('shows what others will see, with units and worked-out values marked', () => {
    const view = sharedView(valid({ deltaEOverE0: 0.035, overconsolidationRatio: 1.3 }));
    expect(view.map((e) => e.field)).not.toContain('boreholeId');
    expect(view).toContainEqual({ field: 'depthBottom', label: 'Depth bottom', value: '6.45 m' });
    expect(view).toContainEqual({ field: 'locationCell', label: 'Location cell', value: 'E82-N57 (worked out)' });
    expect(view).toContainEqual({ field: 'plasticityIndexPct', label: 'PI', value: '50 % (worked out)' });
    expect(view).toContainEqual({
      field: 'sampleQualityClass',
      label: 'Sample quality',
      value: 'class 1, very good to excellent (worked out)',
    });
  });
});

describe('the field table alone decides what is private', () => {
  const siteAddress = (scope: ImportFieldSpec['scope']): ImportFieldSpec => ({
    key: 'siteAddress',
    label: 'Site address',
    scope,
    type: 'text',
    unitKind: 'none',
    required: false,
    synonyms: ['site address'],
    guide: 'Invented for this test.',
  });
  const withAddress = (row: ValidRow): ValidRow => ({
    ...row,
    record: { ...row.record, siteAddress: '12 Quay Street, Saltreach' } as ValidRow['record'],
  });

  it('keeps a field added to the table as private out of the shared part and in the private part', () => {
    const { shared, private: own } = splitRow(withAddress(valid({})), [...IMPORT_FIELDS, siteAddress('private')]);
    expect(shared).not.toHaveProperty('siteAddress');
    expect(JSON.stringify(shared)).not.toContain('Quay Street');
    expect(own).toHaveProperty('siteAddress', '12 Quay Street, Saltreach');
  });

  it('shares the same field when the table marks it shared (the table, not a list in the splitter, decides)', () => {
    const { shared, private: own } = splitRow(withAddress(valid({})), [...IMPORT_FIELDS, siteAddress('shared')]);
    expect(shared).toHaveProperty('siteAddress', '12 Quay Street, Saltreach');
    expect(own).not.toHaveProperty('siteAddress');
  });

  it('shares nothing the table does not list, such as a value on the record that no field names', () => {
    const { shared, private: own } = splitRow(withAddress(valid({})));
    expect(shared).not.toHaveProperty('siteAddress');
    expect(own).not.toHaveProperty('siteAddress');
    expect(shared).not.toHaveProperty('derived');
  });

  it('puts every field of the real table in exactly the part its scope names', () => {
    const { shared, private: own } = splitRow(valid({ samplingMethod: 'piston' }));
    for (const field of IMPORT_FIELDS) {
      expect(Object.hasOwn(own, field.key), field.key).toBe(field.scope === 'private');
      expect(Object.hasOwn(shared, field.key), field.key).toBe(field.scope === 'shared');
    }
  });
});
