// Physically impossible inputs are refused with the field named: by the schema where one field is
// enough, by the engine (EngineInputError → 422) where it takes two fields or the unit system.
import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../src/lib/consolidation/errors';
import { previewEstimate } from '../../../src/lib/consolidation/preview';
import { type EstimatePreviewBody, estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';

type Layer = EstimatePreviewBody['layers'][number];

const clay = (overrides: Partial<Layer> = {}): Layer => ({
  name: 'Clay',
  thickness: 10,
  unitWeightAboveWater: 16.5,
  unitWeightBelowWater: 17,
  cc: 0.6,
  cr: 0.06,
  e0: 1.5,
  ocr: 1,
  cv: 2,
  ...overrides,
});

const body = (overrides: Partial<EstimatePreviewBody> = {}, layer: Partial<Layer> = {}): EstimatePreviewBody => ({
  unitSystem: 'SI',
  waterTableDepth: 1,
  layers: [clay(layer)],
  load: { type: 'wideFill', pressure: 40 },
  drainage: { top: 'pervious', bottom: 'impervious' },
  options: { sublayers: { mode: 'fixed', perLayer: 4 } },
  ...overrides,
});

const drains = (extra: Partial<NonNullable<EstimatePreviewBody['verticalDrains']>> = {}) =>
  ({
    pattern: 'triangular',
    spacing: 1.5,
    drain: { type: 'band', width: 100, thickness: 4 },
    chOverCv: 2,
    ...extra,
  }) as NonNullable<EstimatePreviewBody['verticalDrains']>;

/** The engine's issues for a body the schema accepts. */
function engineIssues(input: EstimatePreviewBody) {
  const parsed = estimatePreviewSchema.parse(input);
  try {
    previewEstimate(parsed);
  } catch (error) {
    if (error instanceof EngineInputError) return error.issues;
    throw error;
  }
  return [];
}

function schemaPaths(input: unknown) {
  const result = estimatePreviewSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
}

describe('impossible inputs refused by the engine with the field named', () => {
  it.each([
    // source: γsat = γw(Gs + e)/(1 + e) > γw for any soil, since Gs > 1 (Terzaghi, Peck & Mesri 1996, phase relations)
    [
      'a saturated unit weight below water’s (9.5 kN/m³)',
      body({}, { unitWeightBelowWater: 9.5 }),
      'layers.0.unitWeightBelowWater',
    ],
    ['a saturated unit weight equal to water’s', body({}, { unitWeightBelowWater: 9.81 }), 'layers.0.unitWeightBelowWater'],
    [
      'a US saturated unit weight below 62.4 pcf',
      body(
        { unitSystem: 'US', waterTableDepth: 3 },
        { thickness: 30, unitWeightAboveWater: 105, unitWeightBelowWater: 60, cv: 0.05 },
      ),
      'layers.0.unitWeightBelowWater',
    ],
    // source: UFC 3-220-10 §5-5.2.1 — Cr is typically 5–10 % of Cc; reloading is stiffer than virgin loading
    ['Cr equal to Cc', body({}, { cr: 0.6 }), 'layers.0.cr'],
    [
      'Cr above Cc, given as distributions (medians compared)',
      body({}, { cc: { type: 'p10p50p90', p10: 0.2, p50: 0.3, p90: 0.4 }, cr: { type: 'lognormal', mean: 0.4, sd: 0.05 } }),
      'layers.0.cr',
    ],
    ['γw of 62.4 in an SI request', body({ options: { waterUnitWeight: 62.4 } }), 'options.waterUnitWeight'],
    [
      'γw of 9.81 in a US request',
      body(
        { unitSystem: 'US', waterTableDepth: 3, options: { waterUnitWeight: 9.81 } },
        { thickness: 30, unitWeightAboveWater: 105, unitWeightBelowWater: 110, cv: 0.05 },
      ),
      'options.waterUnitWeight',
    ],
    [
      'a drain wider than its spacing (2000 mm drain at 1.5 m)',
      body({ verticalDrains: drains({ drain: { type: 'circular', diameter: 2000 } }) }),
      'verticalDrains.spacing',
    ],
    [
      'a smear zone larger than the zone each drain serves',
      body({ verticalDrains: drains({ smear: { ratio: 30, khOverKs: 2 } }) }),
      'verticalDrains.smear.ratio',
    ],
    // source: Δe = Cc·log10(σ'f/σ'0) (UFC 3-220-10 Eq. 5-12 in void-ratio form) cannot exceed e0
    [
      'a compression taking the void ratio below zero',
      body({ load: { type: 'wideFill', pressure: 300 } }, { cc: 3, e0: 0.5, cr: 0.3 }),
      'layers.0.cc',
    ],
    [
      'an mv strain of 100 % or more',
      body({ load: { type: 'wideFill', pressure: 200 } }, { cc: undefined, cr: undefined, ocr: undefined, e0: undefined, mv: 6 }),
      'layers.0.mv',
    ],
  ])('%s', (_, input, path) => {
    expect(schemaPaths(input)).toEqual([]);
    const issues = engineIssues(input);
    expect(issues.map((i) => i.path)).toEqual([path]);
    expect(issues[0]?.message.length).toBeGreaterThan(40);
  });

  it('names every impossible field at once, in the request’s units', () => {
    const input: EstimatePreviewBody = {
      ...body({ unitSystem: 'US', waterTableDepth: 3 }),
      layers: [
        clay({ thickness: 20, unitWeightAboveWater: 105, unitWeightBelowWater: 60, cv: 0.05 }),
        clay({ name: 'Lower clay', thickness: 20, unitWeightAboveWater: 110, unitWeightBelowWater: 112, cr: 0.7, cv: 0.05 }),
      ],
    };
    const issues = engineIssues(input);
    expect(issues.map((i) => i.path)).toEqual(['layers.0.unitWeightBelowWater', 'layers.1.cr']);
    expect(issues[0]?.message).toBe(
      'Layer "Clay": the saturated unit weight below the water table (60 pcf) must be greater than that of water (62.4 pcf), or the effective stress would fall with depth. Saturated soils weigh about 89.1 pcf to 140 pcf; check the value and the unit system.',
    );
  });

  it('computes the profile once the values are possible', () => {
    expect(engineIssues(body({}, { unitWeightBelowWater: 15 }))).toEqual([]);
    expect(engineIssues(body({ verticalDrains: drains({ smear: { ratio: 3, khOverKs: 2 } }) }))).toEqual([]);
  });
});

describe('impossible single values refused by the schema with the field named', () => {
  it.each([
    ['e0 of 0', body({}, { e0: 0 }), 'layers.0.e0'],
    ['a negative e0', body({}, { e0: -0.4 }), 'layers.0.e0'],
    ['a negative thickness', body({}, { thickness: -2 }), 'layers.0.thickness'],
    ['a negative cv', body({}, { cv: -1 }), 'layers.0.cv'],
    ['a cv of 0', body({}, { cv: 0 }), 'layers.0.cv'],
    ['a water table above the ground', body({ waterTableDepth: -1 }), 'waterTableDepth'],
    ['P10 above P50', body({}, { cc: { type: 'p10p50p90', p10: 0.7, p50: 0.5, p90: 0.9 } }), 'layers.0.cc.p50'],
    ['a triangular min above its mode', body({}, { cv: { type: 'triangular', min: 3, mode: 2, max: 4 } }), 'layers.0.cv.mode'],
    ['a drain spacing of 0', body({ verticalDrains: drains({ spacing: 0 }) }), 'verticalDrains.spacing'],
    [
      'a smear ratio below 1',
      body({ verticalDrains: drains({ smear: { ratio: 0.5, khOverKs: 2 } }) }),
      'verticalDrains.smear.ratio',
    ],
    ['a negative Cr', body({}, { cr: -0.02 }), 'layers.0.cr'],
  ])('%s', (_, input, path) => {
    expect(schemaPaths(input)).toContain(path);
  });
});
