import { describe, expect, it, test } from 'vitest';
import { C_ALPHA_OVER_CC, cAlphaFromRatio, secondaryStrain } from '../../../src/lib/consolidation/secondary';

describe('secondary compression (UFC 3-220-10 Eq. 5-18)', () => {
  it('Cα = 0.04 × 0.8, e0 = 1.8, H0 = 4 m, from tp = 2.5 to 50 years: 0.05948 m', () => {
    // source: UFC 3-220-10 Eq. 5-18, ss = Cα/(1+e0)·H0·log10(t/tp); worked by hand (calculator)
    expect(secondaryStrain(0.04 * 0.8, 1.8, 50, 2.5) * 4).toBeCloseTo(0.0594757, 6);
  });

  it('is zero before the end of primary consolidation', () => {
    expect(secondaryStrain(0.03, 1.5, 1, 2)).toBe(0);
    expect(secondaryStrain(0.03, 1.5, 2, 2)).toBe(0);
  });

  test.each([
    // source: Mesri & Godlewski (1977); UFC 3-220-10 Table 5-6 central values; ±0.01 Terzaghi, Peck & Mesri (1996) (from memory)
    ['inorganic-clay-silt', 0.04],
    ['organic-clay-silt', 0.05],
    ['peat', 0.06],
  ] as const)('Cα/Cc for %s is %f ± 0.01', (group, central) => {
    expect(C_ALPHA_OVER_CC[group].central).toBe(central);
    expect(C_ALPHA_OVER_CC[group].halfRange).toBe(0.01);
  });

  it('uses Cr below σ′p and Cc above it (Mesri & Castro 1987, from memory)', () => {
    expect(cAlphaFromRatio(0.04, 0.8, 0.08, true)).toBeCloseTo(0.0032, 12);
    expect(cAlphaFromRatio(0.04, 0.8, 0.08, false)).toBeCloseTo(0.032, 12);
  });
});
