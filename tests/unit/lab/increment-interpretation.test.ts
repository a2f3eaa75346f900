import { describe, expect, it } from 'vitest';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { syntheticIncrementalTest } from '../../../src/lib/lab/synthetic/synthetic-test';
import { voidRatioTest } from './support';

describe('mv and k per increment', () => {
  it('mv = Δe/(1 + e_start)/Δσ′ in m²/MN', () => {
    // source: mv = av/(1 + e0), av = −Δe/Δσ′ (UFC 3-220-10 §5-5.2, mv form). By hand for 100 → 200 kPa:
    // (1.2 − 1.0)/(1 + 1.2)/100 kPa = 9.0909e-4 1/kPa = 0.90909 m²/MN
    const result = interpretIncrementalTest(
      voidRatioTest(1.4, [
        [50, 1.3],
        [100, 1.2],
        [200, 1.0],
        [50, 1.05],
      ]),
    );
    const [first, , third, fourth] = result.increments;
    expect(third?.mv).toEqual({ ok: true, value: expect.closeTo(0.90909, 5) });
    // the first increment starts from e0 at zero stress: (1.4 − 1.3)/2.4/50
    expect(first?.mv).toEqual({ ok: true, value: expect.closeTo(0.8333, 4) });
    // an unloading swells as the load falls: mv is positive
    expect(fourth?.mv).toEqual({ ok: true, value: expect.closeTo((0.05 / 2 / 150) * 1000, 9) });
  });

  it('k = cv·mv·γw from each cv, in m/s', () => {
    // source: cv = k/(mv·γw) (Terzaghi's definition), γw = 9.81 kN/m³
    const test = syntheticIncrementalTest({
      curve: { e0: 1.5, cc: 0.6, cr: 0.08, sigmaPKpa: 80, sigmaV0Kpa: 50, deltaEOverE0: 0.03, bendLogCycles: 0.02 },
      stressesKpa: [25, 50, 100, 200, 400],
      cvM2PerYear: 2,
      seed: 7,
      noiseMm: 0,
    });
    const inc = interpretIncrementalTest(test).increments[3];
    if (!inc?.rootTime.ok || !inc.mv.ok || !inc.kRootTime.ok) throw new Error('expected values');
    const expected = (inc.rootTime.value.cvM2PerYear / (365.25 * 86400)) * (inc.mv.value / 1000) * 9.81;
    expect(inc.kRootTime.value).toBeCloseTo(expected, 20);
    expect(inc.kRootTime.value).toBeGreaterThan(1e-10);
    expect(inc.kRootTime.value).toBeLessThan(1e-8);
  });

  it('reads Cα from the tail after the end of primary, per log cycle of time', () => {
    // source: ASTM D2435/D2435M, Cα = Δe/Δlog t after primary consolidation; the readings carry Cα = 0.04·Cc
    const test = syntheticIncrementalTest({
      curve: { e0: 1.5, cc: 0.6, cr: 0.08, sigmaPKpa: 80, sigmaV0Kpa: 50, deltaEOverE0: 0.03, bendLogCycles: 0.02 },
      stressesKpa: [25, 50, 100, 200, 400, 100],
      cvM2PerYear: 3,
      cAlphaOverCc: 0.04,
      seed: 7,
      noiseMm: 0.0005,
    });
    const result = interpretIncrementalTest(test);
    for (const inc of result.increments.slice(3, 5)) {
      expect(inc.cAlpha.ok && Math.abs(inc.cAlpha.value.cAlpha / 0.024 - 1)).toBeLessThan(0.05);
    }
    expect(result.increments[5]?.cAlpha).toMatchObject({ ok: false, reason: 'out-of-range' });
  });
});
