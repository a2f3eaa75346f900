// Bodies that take only what the caller may set: a saved estimate's profile is checked like the
// preview's, a record correction takes only field keys, a partner row never carries what the bank sets.
// source: OWASP ASVS 5.0 §15.3.3 (mass assignment: allowed fields per action), §15.3.6 (no prototype
// pollution); OWASP Mass Assignment cheat sheet (allow-lists over block-lists).
import { describe, expect, it } from 'vitest';
import { saveEstimateSchema } from '../../../src/lib/schemas/estimate';
import { KEYS_THE_BANK_SETS, partnerJsonUploadSchema } from '../../../src/lib/schemas/partner-upload';
import { recordCorrectionSchema } from '../../../src/lib/schemas/record-correction';

const PROFILE = {
  unitSystem: 'SI',
  waterTableDepth: 1,
  layers: [
    { name: 'Clay', thickness: 6, unitWeightAboveWater: 17, unitWeightBelowWater: 16, cc: 0.6, cr: 0.06, e0: 1.8, ocr: 1, cv: 2 },
  ],
  load: { type: 'wideFill', pressure: 40 },
  drainage: { top: 'pervious', bottom: 'pervious' },
};
const paths = (result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) =>
  (result.error?.issues ?? []).map((issue) => issue.path.map(String).join('.'));

describe('saving an estimate', () => {
  it('accepts a profile the preview accepts', () => {
    expect(saveEstimateSchema.safeParse({ name: 'Quay embankment', unitSystem: 'SI', input: PROFILE }).success).toBe(true);
  });

  it('refuses a profile the preview would refuse, naming the field inside input', () => {
    const result = saveEstimateSchema.safeParse({ name: 'Empty', unitSystem: 'SI', input: { ...PROFILE, layers: [] } });
    expect(result.success).toBe(false);
    expect(paths(result)).toContain('input.layers');
    expect(saveEstimateSchema.safeParse({ name: 'Anything', unitSystem: 'SI', input: { blob: 'x' } }).success).toBe(false);
  });

  it('refuses a profile in another unit system than the estimate', () => {
    const result = saveEstimateSchema.safeParse({ name: 'Mixed', unitSystem: 'US', input: PROFILE });
    expect(paths(result)).toEqual(['input.unitSystem']);
  });
});

describe('a record correction', () => {
  it('takes field keys only, and names a __proto__ key instead of dropping it', () => {
    expect(recordCorrectionSchema.safeParse({ values: { compressionIndex: 0.8, samplingMethod: 'piston' } }).success).toBe(true);
    const polluted = JSON.parse('{"values":{"__proto__":{"status":"published"},"firmId":"x","compressionIndex":0.8}}');
    const result = recordCorrectionSchema.safeParse(polluted);
    expect(paths(result).sort()).toEqual(['values.__proto__', 'values.firmId']);
  });

  it('refuses values that are neither number, text nor null', () => {
    expect(paths(recordCorrectionSchema.safeParse({ values: { compressionIndex: { nested: 1 } } }))).toEqual([
      'values.compressionIndex',
    ]);
  });
});

describe('partner JSON rows', () => {
  it.each(KEYS_THE_BANK_SETS)('refuses a row carrying %s, naming the row (from 1) and the key', (key) => {
    const rows = [{ boreholeId: 'BH-1' }, { boreholeId: 'BH-2', [key]: 'mine' }];
    const result = partnerJsonUploadSchema.safeParse({ rows });
    expect(result.success).toBe(false);
    expect(paths(result)).toEqual([`rows.2.${key}`]);
    expect(result.error?.issues[0]?.message).toContain('set by the bank');
  });

  it('refuses any other key that is not a field, and accepts field keys', () => {
    expect(paths(partnerJsonUploadSchema.safeParse({ rows: [{ boreholeId: 'BH-1', colour: 'grey' }] }))).toEqual([
      'rows.1.colour',
    ]);
    expect(partnerJsonUploadSchema.safeParse({ rows: [{ boreholeId: 'BH-1', depthTop: 4 }] }).success).toBe(true);
  });
});
