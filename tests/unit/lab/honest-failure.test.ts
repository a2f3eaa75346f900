import { describe, expect, it } from 'vitest';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { withDialSlip } from '../../../src/lib/lab/synthetic/planted-problem';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';
import { bilinear, ladder, voidRatioTest } from './support';

const curve = { e0: 1.8, cc: 0.7, cr: 0.08, sigmaPKpa: 90, sigmaV0Kpa: 60, deltaEOverE0: 0.02, bendLogCycles: 0.02 };
const good = syntheticIncrementalTest({
  curve,
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 200],
  cvM2PerYear: 2,
  seed: 3,
  noiseMm: 0.0005,
});

describe('readings that cannot support a value give a typed reason, never a number', () => {
  it('a good test gives every value', () => {
    const r = interpretIncrementalTest(good);
    expect([r.cc.ok, r.cr.ok, r.sigmaPCasagrande.ok, r.sigmaPStrainEnergy.ok]).toEqual([true, true, true, true]);
  });

  it('too few points', () => {
    const r = interpretIncrementalTest(
      voidRatioTest(1.5, [
        [50, 1.45],
        [100, 1.3],
      ]),
    );
    expect(r.sigmaPCasagrande).toMatchObject({ ok: false, reason: 'too-few-points' });
    expect(!r.sigmaPCasagrande.ok && r.sigmaPCasagrande.message).toBe(
      'cannot determine σ′p (Casagrande): the test has 2 first-loading point(s); at least 3 are needed.',
    );
    expect(r.sigmaPStrainEnergy).toMatchObject({ ok: false, reason: 'too-few-points' });
  });

  it('no virgin branch: loading that stops before yield', () => {
    const e = bilinear(1.2, 400, 0.05, 0.6);
    const r = interpretIncrementalTest(
      voidRatioTest(
        1.3,
        ladder(12.5, 400, 2).map((s) => [s, e(s)]),
      ),
    );
    for (const d of [r.cc, r.sigmaPCasagrande, r.sigmaPStrainEnergy])
      expect(d).toMatchObject({ ok: false, reason: 'no-virgin-branch' });
    expect(!r.sigmaPCasagrande.ok && r.sigmaPCasagrande.message).toMatch(
      /^cannot determine σ′p \(Casagrande\): the curve is steepest at the start/,
    );
  });

  it('readings that go backwards: a dial gauge that slips during an increment', () => {
    const r = interpretIncrementalTest(withDialSlip(good, 5, 1.5, 60));
    // the slip here equals the increment's own compression, so the end value alone looks merely flat
    expect(!r.sigmaPCasagrande.ok && r.sigmaPCasagrande.message).toMatch(
      /^cannot determine σ′p \(Casagrande\): increment 5 \(200 kPa\) ends 1.45 mm back from its own reading at 30 min: the gauge may have slipped/,
    );
    expect(r.sigmaPStrainEnergy).toMatchObject({ ok: false, reason: 'goes-backwards' });
    expect(r.cc).toMatchObject({ ok: false, reason: 'goes-backwards' });
    const root = r.increments[4]?.rootTime;
    expect(root).toMatchObject({ ok: false, reason: 'goes-backwards' });
    expect(root && !root.ok && root.message).toBe(
      'cannot determine cv (root time): the readings swell although the increment adds load.',
    );
    expect(r.increments[4]?.logTime).toMatchObject({ ok: false, reason: 'goes-backwards' });
    // the increments before the slip keep their values
    expect(r.increments[3]?.rootTime.ok).toBe(true);
  });

  it('readings too noisy to place the virgin line', () => {
    const e = bilinear(1.2, 100, 0.05, 0.6);
    const scatter = [0, 0, 0, 0, 0.06, -0.06, 0.06, 0];
    const r = interpretIncrementalTest(
      voidRatioTest(
        1.3,
        ladder(12.5, 1600, 2).map((s, i) => [s, e(s) + (scatter[i] ?? 0)]),
      ),
    );
    expect(r.cc).toMatchObject({ ok: false, reason: 'too-noisy' });
    expect(!r.sigmaPCasagrande.ok && r.sigmaPCasagrande.message).toMatch(
      /^cannot determine σ′p \(Casagrande\): the points of the steepest part/,
    );
  });

  it('a curve that cannot be drawn takes every value with it, each saying why', () => {
    const r = interpretIncrementalTest({ specimen: { initialHeightMm: 20, diameterMm: 75 }, increments: good.increments });
    expect(r.increments).toEqual([]);
    for (const d of [r.cc, r.cr, r.sigmaPCasagrande, r.sigmaPStrainEnergy, r.sampleQuality]) {
      expect(d).toMatchObject({ ok: false, reason: 'missing-input' });
    }
    expect(!r.cc.ok && r.cc.message).toBe(
      'cannot determine Cc: give e0, or the dry mass with height, diameter and Gs, or the water content with Gs.',
    );
  });
});
