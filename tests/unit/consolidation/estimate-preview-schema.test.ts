import { describe, expect, it } from 'vitest';
import { estimatePreviewSchema } from '../../../src/lib/schemas/estimate-preview';
import { embankmentBody } from './fixtures';

function issues(body: unknown) {
  const result = estimatePreviewSchema.safeParse(body);
  expect(result.success).toBe(false);
  return result.success ? [] : result.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

describe('estimate preview schema', () => {
  it('accepts a complete body', () => {
    expect(estimatePreviewSchema.safeParse(embankmentBody()).success).toBe(true);
  });

  it('refuses unknown keys and names them', () => {
    const body = { ...embankmentBody(), colour: 'red' };
    expect(issues(body)).toContainEqual({
      path: '',
      message: 'The estimate has field(s) it does not use: colour. Remove them or check the spelling.',
    });
    const layer = { ...embankmentBody().layers[0], cc_value: 1 };
    expect(issues({ ...embankmentBody(), layers: [layer] })[0]?.path).toBe('layers.0');
  });

  it('says which compressibility fields are missing and how to fix it', () => {
    const { cr: _cr, ...noCr } = embankmentBody().layers[0] as Record<string, unknown>;
    expect(issues({ ...embankmentBody(), layers: [noCr] })).toContainEqual({
      path: 'layers.0.cr',
      message: 'Give Cr (recompression index); it is typically 5–10 % of Cc (UFC 3-220-10 §5-5.2.1).',
    });
    const both = { ...embankmentBody().layers[0], sigmaP: 50 };
    expect(issues({ ...embankmentBody(), layers: [both] })).toContainEqual({
      path: 'layers.0.ocr',
      message: "Give either σ'p (sigmaP) or OCR, not both.",
    });
  });

  it('explains bad numbers and distributions per field', () => {
    const layer = { ...embankmentBody().layers[0], thickness: -2 };
    expect(issues({ ...embankmentBody(), layers: [layer] })).toContainEqual({
      path: 'layers.0.thickness',
      message: 'Layer thickness (m or ft) must be greater than 0.',
    });
    const badType = { ...embankmentBody().layers[0], cc: { type: 'uniform', min: 0.5, max: 1 } };
    expect(issues({ ...embankmentBody(), layers: [badType] })[0]?.message).toBe(
      "Cc (compression index) must be a number or a distribution object with type 'normal', 'lognormal', 'triangular' or 'p10p50p90'.",
    );
    const badTriangle = { ...embankmentBody().layers[0], cc: { type: 'triangular', min: 1, mode: 0.5, max: 2 } };
    expect(issues({ ...embankmentBody(), layers: [badTriangle] })).toContainEqual({
      path: 'layers.0.cc.mode',
      message: 'Cc (compression index): a triangular distribution needs min ≤ mode ≤ max. Reorder the three values.',
    });
    const negativeSd = { ...embankmentBody().layers[0], cv: { type: 'lognormal', mean: 2, sd: -1 } };
    expect(issues({ ...embankmentBody(), layers: [negativeSd] })[0]?.path).toBe('layers.0.cv.sd');
  });

  it('refuses a profile that cannot drain and loads with missing geometry', () => {
    expect(issues({ ...embankmentBody(), drainage: { top: 'impervious', bottom: 'impervious' } })).toContainEqual({
      path: 'drainage.top',
      message: 'With both boundaries impervious the clay cannot drain: make the top or the bottom pervious.',
    });
    expect(
      issues({ ...embankmentBody(), load: { type: 'twoToOne', shape: 'rectangle', pressure: 50, width: 3 } }),
    ).toContainEqual({
      path: 'load.length',
      message: 'A 2:1 rectangle needs its length.',
    });
    expect(issues({ ...embankmentBody(), load: { type: 'hexagon', pressure: 50 } })[0]?.message).toMatch(/Load type must be/);
    expect(issues({ ...embankmentBody(), load: { type: 'wideFill' } })).toContainEqual({
      path: 'load.pressure',
      message: 'Give the load pressure, or fillHeight and fillUnitWeight.',
    });
  });

  it('needs exactly one of ch and ch/cv for drains, and bounds the Monte Carlo options', () => {
    const drains = { pattern: 'square', spacing: 1.5, drain: { type: 'circular', diameter: 50 }, ch: 2, chOverCv: 2 };
    expect(issues({ ...embankmentBody(), verticalDrains: drains })[0]?.path).toBe('verticalDrains.ch');
    expect(issues({ ...embankmentBody(), options: { monteCarlo: { realisations: 10 } } })).toContainEqual({
      path: 'options.monteCarlo.realisations',
      message: 'Use at least 100 realisations for meaningful P10/P90.',
    });
    expect(issues({ ...embankmentBody(), unitSystem: 'imperial' })[0]?.message).toBe("unitSystem must be 'SI' or 'US'.");
  });
});
