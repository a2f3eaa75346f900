import { describe, expect, it } from 'vitest';
import { compressionCurve, voidRatioOnLoading } from '../../../src/lib/lab/compression-curve';
import { voidRatioTest } from './support';

const specimen = { initialHeightMm: 20, diameterMm: 75, initialVoidRatio: 1.5 };

describe('the e–log σ′ curve', () => {
  it('turns deformations into void ratios and strains', () => {
    // source: ASTM D2435/D2435M: e = e0 − ΔH/Hs with Hs = H0/(1 + e0) = 8 mm here; ε = ΔH/H0
    const curve = compressionCurve({
      specimen,
      increments: [
        { incrementNo: 1, stressKpa: 25, deformationMm: 0.2 },
        { incrementNo: 2, stressKpa: 50, deformationMm: 0.6 },
      ],
    });
    if (!curve.ok) throw new Error(curve.message);
    expect(curve.value.states.map((s) => s.voidRatio)).toEqual([1.475, 1.425]);
    expect(curve.value.states[1]?.strain).toBeCloseTo(0.6 / 20, 12);
    expect(curve.value.states[1]?.heightMm).toBeCloseTo(19.4, 12);
  });

  it('puts each increment on its branch', () => {
    const curve = compressionCurve(
      voidRatioTest(1.5, [
        [25, 1.45],
        [50, 1.4],
        [100, 1.2],
        [25, 1.25],
        [50, 1.23],
        [100, 1.205],
        [200, 1.0],
      ]),
    );
    expect(curve.ok && curve.value.states.map((s) => s.branch)).toEqual([
      'loading',
      'loading',
      'loading',
      'unloading',
      'reloading',
      'reloading',
      'loading',
    ]);
  });

  it('lists increments that move against their load', () => {
    const curve = compressionCurve(
      voidRatioTest(1.5, [
        [25, 1.45],
        [50, 1.47],
        [100, 1.2],
        [25, 1.1],
      ]),
    );
    expect(curve.ok && curve.value.problems.map((p) => p.message)).toEqual([
      'increment 2 (50 kPa) swells under a larger load: its void ratio goes from 1.45 to 1.47',
      'increment 4 (25 kPa) compresses on unloading: its void ratio goes from 1.2 to 1.1',
    ]);
  });

  it('reads the void ratio at a stress between first-loading points, linearly in log σ′', () => {
    const curve = compressionCurve(
      voidRatioTest(1.5, [
        [10, 1.4],
        [100, 1.2],
      ]),
    );
    expect(curve.ok && voidRatioOnLoading(curve.value, Math.sqrt(1000))).toBeCloseTo(1.3, 12);
    expect(curve.ok && voidRatioOnLoading(curve.value, 5)).toBeNull();
  });

  it('refuses deformations without the specimen height, and increments with neither value', () => {
    const noHeight = compressionCurve({
      specimen: { initialHeightMm: null, diameterMm: null, initialVoidRatio: 1 },
      increments: [
        { incrementNo: 1, stressKpa: 10, deformationMm: 0.1 },
        { incrementNo: 2, stressKpa: 20, deformationMm: 0.2 },
      ],
    });
    expect(!noHeight.ok && noHeight.message).toBe(
      'cannot determine the e–log σ′ curve: deformations are given but the initial specimen height is not; give the height.',
    );
    const empty = compressionCurve({
      specimen,
      increments: [
        { incrementNo: 1, stressKpa: 10 },
        { incrementNo: 2, stressKpa: 20 },
      ],
    });
    expect(empty).toMatchObject({ ok: false, reason: 'missing-input' });
    expect(compressionCurve(voidRatioTest(1.5, [[10, 1.4]]))).toMatchObject({ ok: false, reason: 'too-few-points' });
  });
});
