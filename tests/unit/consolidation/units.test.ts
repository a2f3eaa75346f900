import { describe, expect, it } from 'vitest';
import { KN_PER_M3_PER_PCF, KPA_PER_PSF, M2_PER_YEAR_PER_FT2_PER_DAY, unitFactors } from '../../../src/lib/consolidation/units';

describe('unit conversion factors', () => {
  it('match the published conversion factors', () => {
    // source: NIST SP 811 (2008) Appendix B: 1 lbf/ft² = 47.88026 Pa; 1 lb/ft³ (force) = 157.0875 N/m³
    expect(KPA_PER_PSF).toBeCloseTo(0.04788026, 8);
    expect(KN_PER_M3_PER_PCF).toBeCloseTo(0.1570875, 7);
    // source: 1 ft = 0.3048 m exactly, Julian year of 365.25 days: 0.09290304 × 365.25
    expect(M2_PER_YEAR_PER_FT2_PER_DAY).toBeCloseTo(33.93283536, 7);
  });

  it('names the units of each system', () => {
    expect(unitFactors('SI').labels).toMatchObject({ depth: 'm', stress: 'kPa', settlement: 'mm', cv: 'm²/yr' });
    expect(unitFactors('US').labels).toMatchObject({ depth: 'ft', stress: 'psf', settlement: 'in', cv: 'ft²/day' });
    expect(unitFactors('US').settlementM).toBe(0.0254);
    // 1 ft²/kip = 1/(47.88026 kPa)
    expect(unitFactors('US').mv * 47.88026).toBeCloseTo(1, 6);
  });
});
