import { describe, expect, it } from 'vitest';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { testRecordRowSchema } from '../../../src/lib/import/test-record-row';
import { VOCABULARY } from '../../fixtures/import/pipeline';

const schema = testRecordRowSchema(VOCABULARY);

/** A valid soft-clay row (invented), in SI units. */
const BASE = {
  boreholeId: 'QF-BH-01',
  sampleId: 'U4',
  region: 'Saltreach Estuary',
  geologicalUnit: 'Saltreach Estuarine Clay',
  depthTop: 6,
  depthBottom: 6.45,
  compressionIndex: 0.85,
};

function issues(values: Record<string, unknown>) {
  const result = schema.safeParse({ ...BASE, ...values });
  return result.success ? [] : result.error.issues.map((i) => ({ field: i.path[0] ?? null, message: i.message }));
}

function record(values: Record<string, unknown>) {
  const result = schema.safeParse({ ...BASE, ...values });
  if (!result.success) throw new Error(result.error.issues.map((i) => i.message).join('\n'));
  return result.data.record;
}

describe('the imported row schema', () => {
  it('accepts a minimal oedometer row and resolves the vocabulary', () => {
    expect(record({})).toMatchObject({
      region: 'Saltreach Estuary',
      regionId: 'region-se',
      geologicalUnitId: 'unit-sec',
      locationCell: null,
    });
  });

  it('covers exactly the import fields', () => {
    const shapeKeys = Object.keys((schema as unknown as { in: { out: { shape: object } } }).in.out.shape).filter(
      (k) => k !== 'increments',
    );
    expect(shapeKeys.sort()).toEqual(IMPORT_FIELDS.map((f) => f.key).sort());
  });

  it.each([
    ['boreholeId', 'borehole (or location) id is missing'],
    ['region', 'region is missing'],
    ['geologicalUnit', 'geological unit is missing'],
    ['depthTop', 'Depth top is missing'],
    ['depthBottom', 'Depth bottom is missing'],
  ])('requires %s', (field, phrase) => {
    expect(issues({ [field]: '  ' })).toContainEqual({ field, message: expect.stringContaining(phrase) });
  });

  it('requires at least one consolidation parameter', () => {
    expect(issues({ compressionIndex: null })).toEqual([
      { field: null, message: expect.stringContaining('not an oedometer result') },
    ]);
    for (const key of ['cvNc', 'cvOc', 'preconsolidationStress', 'mv', 'secondaryCompressionIndex']) {
      expect(issues({ compressionIndex: null, [key]: 0.5 })).toEqual([]);
    }
  });

  // Physical ranges: common practice, except where a source is named in row-ranges.ts.
  it.each([
    [
      'liquidLimitPct',
      9,
      'LL is 9 %, outside the range Claybank accepts (10 to 500 %). Enter LL in %; if the column holds fractions',
    ],
    ['liquidLimitPct', 900, 'LL is 900 %, outside the range Claybank accepts (10 to 500 %).'],
    ['initialVoidRatio', 0.05, 'e0 is 0.05, outside the range Claybank accepts (0.2 to 15).'],
    ['initialVoidRatio', 16, 'e0 is 16'],
    ['compressionIndex', 0.005, 'Cc is 0.005'],
    ['compressionIndex', 11, 'Cc is 11'],
    ['recompressionIndex', -0.01, 'Cr is -0.01'],
    ['depthTop', -1, 'Depth top is -1 m'],
    ['depthTop', 400, 'If the column is in feet, choose ft'],
    ['waterContentPct', 1600, 'wn is 1,600 %'],
    ['specificGravity', 1.4, 'Gs is 1.4'],
    ['specificGravity', 3.6, 'Gs is 3.6'],
    ['bulkUnitWeight', 1.6, 'multiply it by 9.81'],
    ['bulkUnitWeight', 110, 'choose pcf'],
    ['overconsolidationRatio', 0.4, 'OCR is 0.4'],
    ['cvNc', 0, 'cv (NC range) is 0 m²/yr, outside the range Claybank accepts (more than 0 up to 100,000 m²/yr).'],
    ['deltaEOverE0', 4, 'not in %'],
    ['deltaEOverE0', -0.01, 'Δe/e0 is -0.01'],
    ['organicContentPct', 101, 'Organic content is 101 %'],
    ['preconsolidationStress', 25_000, 'If the column is in psf or tsf, choose that unit.'],
    ['plasticityIndexPct', -2, 'PI is -2 %'],
  ])('refuses %s = %s', (field, value, phrase) => {
    expect(issues({ [field]: value })).toContainEqual({ field, message: expect.stringContaining(phrase) });
  });

  it('accepts the ends of each range', () => {
    expect(issues({ liquidLimitPct: 10, plasticLimitPct: 5 })).toEqual([]);
    expect(issues({ liquidLimitPct: 500 })).toEqual([]);
    expect(issues({ initialVoidRatio: 0.2 })).toEqual([]);
    expect(issues({ initialVoidRatio: 15 })).toEqual([]);
    expect(issues({ compressionIndex: 10, recompressionIndex: 0 })).toEqual([]);
    expect(issues({ waterContentPct: 1500, specificGravity: 1.5, bulkUnitWeight: 8, deltaEOverE0: 0.5 })).toEqual([]);
    expect(
      issues({ waterContentPct: 0, specificGravity: 3.5, bulkUnitWeight: 25, deltaEOverE0: 0, overconsolidationRatio: 0.5 }),
    ).toEqual([]);
  });

  it('allows a low Gs for peat and organic soils', () => {
    expect(issues({ uscsSymbol: 'Pt', specificGravity: 1.4 })).toEqual([]);
    expect(issues({ organicContentPct: 60, specificGravity: 1.3 })).toEqual([]);
    expect(issues({ uscsSymbol: 'Pt', specificGravity: 1.1 })).toHaveLength(1);
  });

  it('needs depth bottom below depth top', () => {
    expect(issues({ depthTop: 8.45, depthBottom: 8 })).toEqual([
      {
        field: 'depthBottom',
        message: 'Depth bottom (8 m) is not below depth top (8.45 m). Check the two columns are not swapped.',
      },
    ]);
    expect(issues({ depthTop: 8, depthBottom: 8 })).toHaveLength(1);
  });

  it('checks the Atterberg limits against each other and works out PI', () => {
    expect(issues({ liquidLimitPct: 40, plasticLimitPct: 45 })).toContainEqual({
      field: 'plasticLimitPct',
      message: expect.stringContaining('PL (45 %) is above LL (40 %)'),
    });
    expect(issues({ liquidLimitPct: 62, plasticLimitPct: 30, plasticityIndexPct: 30 })).toContainEqual({
      field: 'plasticityIndexPct',
      message: expect.stringContaining('LL − PL (62 − 30 = 32 %)'),
    });
    expect(issues({ liquidLimitPct: 62, plasticLimitPct: 30, plasticityIndexPct: 31 })).toEqual([]);
    expect(issues({ liquidLimitPct: 60, plasticityIndexPct: 70 })).toContainEqual({
      field: 'plasticityIndexPct',
      message: expect.stringContaining('more than LL'),
    });
    const r = record({ liquidLimitPct: 82, plasticLimitPct: 32 });
    expect(r.plasticityIndexPct).toBe(50);
    expect(r.derived).toContain('plasticityIndexPct');
  });

  it('needs Cr below Cc', () => {
    expect(issues({ compressionIndex: 0.7, recompressionIndex: 0.9 })).toEqual([
      { field: 'recompressionIndex', message: expect.stringContaining('Cr (0.9) is not less than Cc (0.7)') },
    ]);
    expect(issues({ compressionIndex: 0.7, recompressionIndex: 0.7 })).toHaveLength(1);
  });

  it('works out OCR = σ′p/σ′v0 and checks a given OCR within 10 %', () => {
    const r = record({ preconsolidationStress: 120, verticalEffectiveStress: 60 });
    expect(r.overconsolidationRatio).toBe(2);
    expect(r.derived).toContain('overconsolidationRatio');
    expect(issues({ preconsolidationStress: 120, verticalEffectiveStress: 60, overconsolidationRatio: 2.19 })).toEqual([]);
    expect(issues({ preconsolidationStress: 120, verticalEffectiveStress: 60, overconsolidationRatio: 2.25 })).toEqual([
      { field: 'overconsolidationRatio', message: expect.stringContaining("σ'p ÷ σ'v0 (120 ÷ 60 = 2) within 10 %") },
    ]);
    expect(issues({ preconsolidationStress: 20, verticalEffectiveStress: 60 })).toContainEqual({
      field: 'preconsolidationStress',
      message: expect.stringContaining('below 0.5'),
    });
    expect(record({ preconsolidationStress: 120, verticalEffectiveStress: 0 }).overconsolidationRatio).toBeNull();
  });

  it('bounds σ′v0 by the weight of the soil above (25 kN/m³ × depth + 50 kPa; common practice)', () => {
    expect(issues({ verticalEffectiveStress: 211.3 })).toContainEqual({
      field: 'verticalEffectiveStress',
      message: expect.stringContaining('choose that unit'),
    });
    expect(issues({ verticalEffectiveStress: 211.25 })).toEqual([]);
  });

  // source: Lunne, Berre & Strandvik (1997) class limits on Δe/e0 for OCR 1–2 and 2–4
  it.each([
    [0.039, 1.5, 1],
    [0.04, 1.5, 2],
    [0.069, 1.5, 2],
    [0.07, 1.5, 3],
    [0.14, 1.5, 3],
    [0.141, 1.5, 4],
    [0.029, 3, 1],
    [0.03, 3, 2],
    [0.05, 3, 3],
    [0.1, 3, 3],
    [0.11, 3, 4],
    [0.035, 2, 2],
    [0.035, 0.8, 1],
    [0.02, 5, null],
  ])('Δe/e0 %s at OCR %s → class %s', (deltaEOverE0, overconsolidationRatio, cls) => {
    expect(record({ deltaEOverE0, overconsolidationRatio }).sampleQualityClass).toBe(cls);
  });

  it('derives the sample quality class from a worked-out OCR too, and not without OCR', () => {
    expect(record({ deltaEOverE0: 0.05, preconsolidationStress: 72, verticalEffectiveStress: 55 }).sampleQualityClass).toBe(2);
    expect(record({ deltaEOverE0: 0.05 }).sampleQualityClass).toBeNull();
  });

  it.each([
    ['ch', 'CH'],
    ['PT', 'Pt'],
    ['pt', 'Pt'],
    ['CL/ML', 'CL-ML'],
    ['ML-CL', 'CL-ML'],
    ['SM-SC', 'SC-SM'],
    ['gw - gm', 'GW-GM'],
    ['GC-GM', 'GC-GM'],
  ])('writes the group symbol %j as %j', (input, symbol) => {
    expect(record({ uscsSymbol: input }).uscsSymbol).toBe(symbol);
  });

  it('refuses a group symbol outside ASTM D2487', () => {
    expect(issues({ uscsSymbol: 'CLAY' })).toEqual([
      { field: 'uscsSymbol', message: expect.stringContaining('"CLAY" is not an ASTM D2487 group symbol') },
    ]);
  });

  it.each([
    ['IL', 'incremental'],
    ['incremental loading', 'incremental'],
    ['Incremental', 'incremental'],
    ['CRS', 'crs'],
    ['constant rate of strain', 'crs'],
    ['Constant Rate of Strain (CRS)', 'crs'],
  ])('reads the test method %j as %s', (input, method) => {
    expect(record({ testMethod: input }).testMethod).toBe(method);
  });

  it('refuses an unknown test method', () => {
    expect(issues({ testMethod: 'triaxial' })).toEqual([
      { field: 'testMethod', message: expect.stringContaining('write incremental (or IL) or CRS') },
    ]);
  });

  it('matches region and geological unit by name or slug, whatever the case', () => {
    expect(record({ region: 'SALTREACH ESTUARY', geologicalUnit: 'saltreach-estuarine-clay' })).toMatchObject({
      region: 'Saltreach Estuary',
      geologicalUnit: 'Saltreach Estuarine Clay',
    });
    expect(issues({ region: 'Saltreach Estuery' })).toEqual([
      { field: 'region', message: expect.stringContaining('Did you mean "Saltreach Estuary"?') },
    ]);
    expect(issues({ geologicalUnit: 'London Clay' })).toEqual([
      {
        field: 'geologicalUnit',
        message: expect.stringContaining('Known geological units: Saltreach Estuarine Clay, Vennmoor Peat'),
      },
    ]);
  });

  it('gives the location cell from easting/northing on a 5 km grid, or checks a written one', () => {
    const r = record({ easting: 412_300, northing: 286_700 });
    expect(r.locationCell).toBe('E82-N57');
    expect(r.derived).toContain('locationCell');
    expect(record({ easting: 4_999, northing: 0 }).locationCell).toBe('E00-N00');
    expect(record({ locationCell: 'e12-n07', easting: 412_300, northing: 286_700 }).locationCell).toBe('E12-N07');
    expect(issues({ locationCell: 'E1-N7' })).toEqual([
      { field: 'locationCell', message: expect.stringContaining('not in the form E12-N07') },
    ]);
    expect(issues({ easting: 412_300 })).toEqual([
      { field: 'northing', message: 'Easting is given without northing; give both, or neither.' },
    ]);
    expect(issues({ easting: -1200, northing: 5000 })).toEqual([
      { field: 'easting', message: expect.stringContaining('Give a location cell') },
    ]);
  });

  it('takes numbers written as text (JSON callers) and refuses other types plainly', () => {
    expect(record({ depthTop: ' 6.0 ', compressionIndex: '0.85' }).depthTop).toBe(6);
    expect(issues({ compressionIndex: 'lots' })).toEqual([
      { field: 'compressionIndex', message: 'Cc must be a number, such as 1.25.' },
    ]);
    expect(issues({ boreholeId: 12 })).toEqual([]);
    expect(issues({ notes: 'x'.repeat(2001) })).toEqual([
      { field: 'notes', message: 'Notes is longer than 2000 characters; shorten it.' },
    ]);
  });

  it('checks increments and returns them in order', () => {
    const inc = (incrementNo: number, appliedStressKpa: number | null, extra = {}) => ({
      incrementNo,
      appliedStressKpa,
      ...extra,
    });
    const parsed = schema.safeParse({
      ...BASE,
      compressionIndex: null,
      increments: [inc(2, 50), inc(1, 25, { voidRatioEnd: 1.9 })],
    });
    expect(parsed.success && parsed.data.increments.map((i) => i.incrementNo)).toEqual([1, 2]);
    expect(issues({ increments: [inc(1, 25), inc(1, 50)] })).toContainEqual({
      field: 'increments',
      message: 'Increment 1: this increment number appears twice.',
    });
    expect(issues({ increments: [inc(1, null)] })).toContainEqual({
      field: 'increments',
      message: 'Increment 1: the applied stress is missing.',
    });
    expect(issues({ increments: [inc(1, 25, { voidRatioEnd: -1 })] })).toContainEqual({
      field: 'increments',
      message: expect.stringContaining('the void ratio at the end is -1'),
    });
  });
});
