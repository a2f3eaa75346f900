import { describe, expect, it } from 'vitest';
import { verticalStressAtDepth } from '../../../src/lib/consolidation/stress-vertical';

const layers = [
  { thicknessM: 2, unitWeightAboveKnPerM3: 18, unitWeightBelowKnPerM3: 20 },
  { thicknessM: 5, unitWeightAboveKnPerM3: 16, unitWeightBelowKnPerM3: 17 },
];

describe('in-situ vertical stress', () => {
  it('at 4 m with the water table at 1.2 m: σv = 71.6, u = 27.468, σ′v0 = 44.132 kPa', () => {
    // source: effective stress principle (Terzaghi 1925); worked by hand: 1.2×18 + 0.8×20 + 2×17 = 71.6; u = 2.8×9.81
    const s = verticalStressAtDepth(layers, 1.2, 4);
    expect(s.totalKpa).toBeCloseTo(71.6, 10);
    expect(s.porePressureKpa).toBeCloseTo(27.468, 10);
    expect(s.effectiveKpa).toBeCloseTo(44.132, 10);
  });

  it('uses bulk unit weights only when the water table is below the point, and the given γw', () => {
    const dry = verticalStressAtDepth(layers, 10, 3);
    expect(dry.totalKpa).toBeCloseTo(2 * 18 + 16, 10);
    expect(dry.porePressureKpa).toBe(0);
    expect(verticalStressAtDepth(layers, 0, 1, 10).effectiveKpa).toBeCloseTo(10, 10);
  });

  it('continues the last layer below the profile', () => {
    expect(verticalStressAtDepth(layers, 0, 9).totalKpa).toBeCloseTo(2 * 20 + 7 * 17, 10);
  });
});
