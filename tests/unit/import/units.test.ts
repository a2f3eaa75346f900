import { describe, expect, it } from 'vitest';
import {
  KN_PER_M3_PER_PCF,
  KPA_PER_PSF,
  KPA_PER_TSF,
  M_PER_S_PER_FT_PER_DAY,
  M2_PER_MN_PER_FT2_PER_KIP,
  M2_PER_YEAR_PER_CM2_PER_S,
  M2_PER_YEAR_PER_FT2_PER_DAY,
  METRES_PER_FOOT,
  parseUnit,
  siUnit,
  toSi,
  UNIT_CHOICES,
} from '../../../src/lib/import/units';

// source: NIST SP 811 (2008), Appendix B (B.8 and B.9 factors, as printed there to 7 significant figures)
const NIST = {
  footInM: 0.3048, // exact
  poundForceInN: 4.448222,
  psfInPa: 47.88026,
  kipInN: 4.448222e3,
  tonForce2000LbInN: 8.896443e3,
  poundPerCubicFootInKgPerM3: 16.01846,
  standardGravity: 9.80665, // exact
  stokesInM2PerS: 1e-4, // exact
  squareFootPerHourInM2PerS: 2.58064e-5,
  footPerHourInMPerS: 8.466667e-5,
};
const JULIAN_YEAR_S = 365.25 * 86_400; // common practice for cv in m²/yr

describe('unit factors to the bank units', () => {
  it('length: ft = 0.3048 m exactly', () => {
    expect(METRES_PER_FOOT).toBe(NIST.footInM);
    expect(toSi(10, 'length', 'ft')).toBeCloseTo(3.048, 12);
  });

  it('stress: psf, tsf and MPa to kPa', () => {
    expect(KPA_PER_PSF).toBeCloseTo(NIST.psfInPa / 1000, 8);
    expect(KPA_PER_PSF).toBeCloseTo(0.0478802589803, 12);
    expect(KPA_PER_TSF).toBeCloseTo(NIST.tonForce2000LbInN / (NIST.footInM * NIST.footInM) / 1000, 4);
    expect(toSi(2, 'stress', 'MPa')).toBe(2000);
    expect(toSi(1000, 'stress', 'psf')).toBeCloseTo(47.88026, 4);
  });

  it('unit weight: pcf to kN/m³ via lb/ft³ × standard gravity', () => {
    expect(KN_PER_M3_PER_PCF).toBeCloseTo((NIST.poundPerCubicFootInKgPerM3 * NIST.standardGravity) / 1000, 6);
    expect(KN_PER_M3_PER_PCF).toBeCloseTo(0.157087463, 8);
  });

  it('cv: cm²/s, ft²/day and m²/s to m²/yr (Julian year)', () => {
    expect(M2_PER_YEAR_PER_CM2_PER_S).toBeCloseTo(NIST.stokesInM2PerS * JULIAN_YEAR_S, 9);
    expect(M2_PER_YEAR_PER_CM2_PER_S).toBeCloseTo(3155.76, 9);
    expect(M2_PER_YEAR_PER_FT2_PER_DAY).toBeCloseTo((NIST.squareFootPerHourInM2PerS / 24) * JULIAN_YEAR_S, 6);
    expect(M2_PER_YEAR_PER_FT2_PER_DAY).toBeCloseTo(33.93, 2);
    expect(toSi(1e-7, 'cv', 'm2/s')).toBeCloseTo(3.15576, 9);
  });

  it('mv: m²/kN and ft²/kip to m²/MN', () => {
    expect(toSi(0.001, 'mv', 'm2/kN')).toBeCloseTo(1, 12);
    expect(M2_PER_MN_PER_FT2_PER_KIP).toBeCloseTo(((NIST.footInM * NIST.footInM) / NIST.kipInN) * 1e6, 4);
  });

  it('permeability: cm/s and ft/day to m/s', () => {
    expect(toSi(1e-7, 'permeability', 'cm/s')).toBeCloseTo(1e-9, 20);
    expect(M_PER_S_PER_FT_PER_DAY).toBeCloseTo(NIST.footPerHourInMPerS / 24, 11);
  });

  it('offers the SI unit first for every kind', () => {
    expect(Object.fromEntries(Object.entries(UNIT_CHOICES).map(([k, v]) => [k, v[0]?.id]))).toEqual({
      length: 'm',
      stress: 'kPa',
      cv: 'm2/yr',
      unitWeight: 'kN/m3',
      mv: 'm2/MN',
      permeability: 'm/s',
    });
    for (const choices of Object.values(UNIT_CHOICES)) expect(choices[0]?.toSi).toBe(1);
    expect(siUnit('none')).toBeNull();
  });

  it.each([
    ['ft', 'length', 'ft'],
    ['m bgl', 'length', 'm'],
    ['m²/yr', 'cv', 'm2/yr'],
    ['m2 per year', 'cv', 'm2/yr'],
    ['cm2/sec', 'cv', 'cm2/s'],
    ['lb/ft³', 'unitWeight', 'pcf'],
    ['kN/m2', 'stress', 'kPa'],
    ['1/MPa', 'mv', 'm2/MN'],
    ['ft/day', 'permeability', 'ft/day'],
  ])('reads the unit "%s" as %s %s', (text, kind, id) => {
    expect(parseUnit(text)).toMatchObject({ kind, unit: { id } });
  });

  it('does not guess an unknown unit', () => {
    expect(parseUnit('bar')).toBeNull();
    expect(parseUnit('NC range')).toBeNull();
  });
});
