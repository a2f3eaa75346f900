import { describe, expect, it } from 'vitest';
import { formatQuantity, fromSi, headerWithUnit, type QuantityKind, toSi, unitLabel } from '../../../src/lib/units/display';

// source: NIST Special Publication 811 (2008), Appendix B.8, factors to SI:
//   foot → m 3.048 E-01 (exact); inch → m 2.54 E-02 (exact);
//   pound-force per square foot → Pa 4.788 026 E+01;
//   pound per cubic foot → kg/m³ 1.601 846 E+01, times standard gravity 9.806 65 m/s² (exact) for lbf/ft³;
//   square foot per second → m²/s 9.290 304 E-02 (exact); kip (1000 lbf) → N 4.448 222 E+03.
const NIST = {
  ftToM: 0.3048,
  inToM: 0.0254,
  psfToPa: 47.88026,
  pcfToNPerM3: 16.01846 * 9.80665,
  ft2PerSToM2PerS: 0.09290304,
  kipToN: 4448.222,
};
const SECONDS_PER_DAY = 86_400;
const SECONDS_PER_JULIAN_YEAR = 365.25 * SECONDS_PER_DAY; // common practice: cv per Julian year

/** [kind, one US unit, the same in the stored SI unit from NIST's factors] */
const ONE_US_UNIT_IN_SI: [QuantityKind, string, number][] = [
  ['length', 'ft', NIST.ftToM],
  ['settlement', 'in', NIST.inToM],
  ['drainSize', 'in', NIST.inToM],
  ['stress', 'psf', NIST.psfToPa / 1000],
  ['unitWeight', 'pcf', NIST.pcfToNPerM3 / 1000],
  ['cv', 'ft²/day', (NIST.ft2PerSToM2PerS / SECONDS_PER_DAY) * SECONDS_PER_JULIAN_YEAR],
  ['mv', 'ft²/kip', (NIST.ft2PerSToM2PerS / NIST.kipToN) * 1e6],
  ['permeability', 'ft/day', NIST.ftToM / SECONDS_PER_DAY],
];

describe('display units against NIST SP 811 factors', () => {
  it.each(ONE_US_UNIT_IN_SI)('%s: 1 %s is the published SI value', (kind, label, siValue) => {
    expect(unitLabel(kind, 'US')).toBe(label);
    // NIST gives its inexact factors to 7 significant figures: agree to 1 part in 10⁶.
    expect(Math.abs(toSi(1, kind, 'US') / siValue - 1)).toBeLessThan(1e-6);
    expect(fromSi(siValue, kind, 'US')).toBeCloseTo(1, 6);
  });

  it.each(ONE_US_UNIT_IN_SI)('%s round-trips through both systems', (kind) => {
    for (const value of [0.0123, 1, 987.6]) {
      expect(toSi(fromSi(value, kind, 'US'), kind, 'US')).toBeCloseTo(value, 10);
      expect(toSi(fromSi(value, kind, 'SI'), kind, 'SI')).toBeCloseTo(value, 10);
    }
  });

  it('shows settlement stored in metres as mm or inches', () => {
    expect(fromSi(0.254, 'settlement', 'SI')).toBeCloseTo(254, 10);
    expect(fromSi(0.254, 'settlement', 'US')).toBeCloseTo(10, 10);
  });

  it('formats every figure to three significant figures, with the unit when asked', () => {
    expect(formatQuantity(100, 'stress', 'SI', { withUnit: true })).toBe('100 kPa');
    expect(formatQuantity(100, 'stress', 'US', { withUnit: true })).toBe('2,090 psf');
    expect(formatQuantity(1.2345, 'ratio', 'US')).toBe('1.23');
    expect(formatQuantity(null, 'cv', 'SI')).toBe('—');
    expect(formatQuantity(Number.NaN, 'cv', 'SI')).toBe('—');
  });

  it('names the unit in a header, and none for a ratio', () => {
    expect(headerWithUnit("σ'p", 'stress', 'US')).toBe("σ'p (psf)");
    expect(headerWithUnit('Cc', 'ratio', 'SI')).toBe('Cc');
    expect(headerWithUnit('cv (NC)', 'cv', 'SI')).toBe('cv (NC) (m²/yr)');
  });
});
