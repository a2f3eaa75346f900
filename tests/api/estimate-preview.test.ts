// POST /api/estimates/preview: the route answers with the engine's own numbers, refuses bad input
// field by field, and saves nothing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readmePreviewExample } from '../../scripts/lib/readme-preview-example.mjs';
import { previewEstimate } from '../../src/lib/consolidation';
import { estimatePreviewSchema } from '../../src/lib/schemas/estimate-preview';
import { base, call, db, firmIdOf, inTenantTransaction, sessionCookie, userIdOf } from './support/world';

let engineer = '';
beforeAll(async () => {
  engineer = await sessionCookie(await userIdOf('engineer@quillfen.example.test'));
});
afterAll(() => db.destroy());

// A 10 m normally consolidated clay under a wide 50 kPa fill, drained top and bottom.
const PROFILE = {
  unitSystem: 'SI',
  waterTableDepth: 0,
  layers: [
    {
      name: 'Estuarine clay',
      thickness: 10,
      unitWeightAboveWater: 16,
      unitWeightBelowWater: 16,
      cc: 0.9,
      cr: 0.09,
      e0: 2.2,
      ocr: 1,
      cv: 1.5,
    },
  ],
  load: { type: 'wideFill', pressure: 50 },
  drainage: { top: 'pervious', bottom: 'pervious' },
};

describe('POST /api/estimates/preview', () => {
  it('answers with the same numbers as the engine', async () => {
    const result = await call('POST', '/api/estimates/preview', engineer, PROFILE);
    expect(result.status).toBe(200);
    const expected = JSON.parse(JSON.stringify(previewEstimate(estimatePreviewSchema.parse(PROFILE))));
    expect(result.body).toEqual(expected);
  });

  it('gives a primary settlement consistent with UFC 3-220-10 Eq. 5-12 computed by hand in thin slices', async () => {
    // source: UFC 3-220-10 Eq. 5-12 — sc = Cc/(1+e0)·H·log10((σ'v0+Δσ)/σ'v0), summed over 1000 slices here.
    const gammaPrime = 16 - 9.81;
    let handMm = 0;
    for (let i = 0; i < 1000; i++) {
      const z = (i + 0.5) * 0.01;
      const sigma0 = gammaPrime * z;
      handMm += (0.9 / 3.2) * 0.01 * Math.log10((sigma0 + 50) / sigma0) * 1000;
    }
    const result = await call('POST', '/api/estimates/preview', engineer, PROFILE);
    const primaryMm = (result.body as { settlement: { primary: number } }).settlement.primary;
    expect(Math.abs(primaryMm - handMm) / handMm).toBeLessThan(0.01);
    expect((result.body as { units: { settlement: string } }).units.settlement).toBe('mm');
    expect(JSON.stringify(result.body)).toContain('licensed');
  });

  it('refuses an invalid profile with one issue per field', async () => {
    const bad = {
      ...PROFILE,
      layers: [{ ...PROFILE.layers[0], thickness: -2, cc: 'high' }],
      drainage: { top: 'pervious', bottom: 'sometimes' },
      firmId: 'x',
    };
    const result = await call('POST', '/api/estimates/preview', engineer, bad);
    expect(result.status).toBe(400);
    const error = (result.body as { error: { code: string; issues: { path: string; message: string }[] } }).error;
    expect(error.code).toBe('VALIDATION_FAILED');
    const paths = error.issues.map((issue) => issue.path);
    expect(paths).toEqual(expect.arrayContaining(['layers.0.thickness', 'layers.0.cc', 'drainage.bottom']));
    expect(JSON.stringify(error.issues)).toContain('firmId');
  });

  it('refuses a physically impossible profile with 422 and every field named', async () => {
    const impossible = {
      ...PROFILE,
      waterTableDepth: 1,
      layers: [{ ...PROFILE.layers[0], unitWeightBelowWater: 9.5, cr: 0.95 }],
    };
    const result = await call('POST', '/api/estimates/preview', engineer, impossible);
    expect(result.status).toBe(422);
    const error = (result.body as { error: { code: string; message: string; issues: { path: string; message: string }[] } })
      .error;
    expect(error.code).toBe('UNPROCESSABLE');
    expect(error.issues.map((issue) => issue.path)).toEqual(['layers.0.unitWeightBelowWater', 'layers.0.cr']);
    expect(error.issues[0]?.message).toContain('must be greater than that of water (9.81 kN/m³)');
    expect(error.message).toMatch(/^The profile cannot be computed: /);
  });

  it("answers the README's example from the worker pool with the engine's numbers and no caching", async () => {
    const example = readmePreviewExample();
    const response = await fetch(`${base}/api/estimates/preview`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: engineer, origin: base },
      body: JSON.stringify(example),
    });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/json; charset=utf-8');
    expect(response.headers.get('cache-control')).toBe('no-store');
    const expected = JSON.parse(JSON.stringify(previewEstimate(estimatePreviewSchema.parse(example))));
    expect(await response.json()).toEqual(expected);
  });

  it("saves nothing (counted inside the engineer's firm, where its estimates are visible)", async () => {
    const firmId = await firmIdOf('quillfen');
    const count = () =>
      inTenantTransaction(db, { firmId, platformRole: 'user' }, (trx) =>
        trx
          .selectFrom('estimate')
          .select((eb) => eb.fn.countAll<number>().as('n'))
          .executeTakeFirstOrThrow(),
      );
    const saved = await call('POST', '/api/estimates', engineer, { name: 'Preview check', unitSystem: 'SI', input: PROFILE });
    expect(saved.status).toBe(201);
    const before = await count();
    expect(before.n).toBeGreaterThan(0);
    await call('POST', '/api/estimates/preview', engineer, PROFILE);
    expect((await count()).n).toBe(before.n);
  });
});
