/**
 * Unit systems at the edge of the engine. Inside, everything is SI: m, kPa, kN/m³, m²/yr,
 * 1/kPa, years, settlement in m. Requests and results use either SI (settlement in mm, mv in
 * m²/MN) or US customary units (ft, psf, pcf, ft²/day, ft²/kip, in).
 * Exact definitions: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N (NIST SP 811);
 * 1 year = 365.25 days (Julian year) for cv and ch.
 */

export type UnitSystem = 'SI' | 'US';

/** Exact definitions (NIST SP 811 Appendix B) and the Julian year. */
export const METRES_PER_FOOT = 0.3048;
export const METRES_PER_INCH = 0.0254;
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
export const DAYS_PER_YEAR = 365.25;
/** 1 psf in kPa (≈ 0.0478803). */
export const KPA_PER_PSF = NEWTONS_PER_POUND_FORCE / (METRES_PER_FOOT * METRES_PER_FOOT) / 1000;
/** 1 pcf in kN/m³ (≈ 0.157087). */
export const KN_PER_M3_PER_PCF = NEWTONS_PER_POUND_FORCE / METRES_PER_FOOT ** 3 / 1000;
/** 1 ft²/day in m²/yr (≈ 33.9335). */
export const M2_PER_YEAR_PER_FT2_PER_DAY = METRES_PER_FOOT * METRES_PER_FOOT * DAYS_PER_YEAR;
/** γw defaults: 9.81 kN/m³ for SI, 62.4 pcf for US input (as the issue prescribes). */
export const WATER_UNIT_WEIGHT = { SI: 9.81, US: 62.4 } as const;

export interface UnitLabels {
  depth: string;
  stress: string;
  unitWeight: string;
  settlement: string;
  cv: string;
  mv: string;
  drainSize: string;
  discharge: string;
  time: string;
}

/** Multiply a value in the request's units by these factors to get SI. */
export interface UnitFactors {
  labels: UnitLabels;
  /** → m */
  length: number;
  /** → kPa */
  stress: number;
  /** → kN/m³ */
  unitWeight: number;
  /** → m²/yr */
  cv: number;
  /** → 1/kPa */
  mv: number;
  /** drain width, thickness, diameter → m */
  drainSize: number;
  /** qw → m³/yr */
  discharge: number;
  /** settlement m → output unit (mm or in): divide by this */
  settlementM: number;
}

/** Factors from a request's unit system to SI, and the unit labels for results. */
export function unitFactors(system: UnitSystem): UnitFactors {
  if (system === 'SI') {
    return {
      labels: {
        depth: 'm',
        stress: 'kPa',
        unitWeight: 'kN/m³',
        settlement: 'mm',
        cv: 'm²/yr',
        mv: 'm²/MN',
        drainSize: 'mm',
        discharge: 'm³/yr',
        time: 'years',
      },
      length: 1,
      stress: 1,
      unitWeight: 1,
      cv: 1,
      mv: 0.001,
      drainSize: 0.001,
      discharge: 1,
      settlementM: 0.001,
    };
  }
  return {
    labels: {
      depth: 'ft',
      stress: 'psf',
      unitWeight: 'pcf',
      settlement: 'in',
      cv: 'ft²/day',
      mv: 'ft²/kip',
      drainSize: 'in',
      discharge: 'ft³/yr',
      time: 'years',
    },
    length: METRES_PER_FOOT,
    stress: KPA_PER_PSF,
    unitWeight: KN_PER_M3_PER_PCF,
    cv: M2_PER_YEAR_PER_FT2_PER_DAY,
    mv: 1 / (1000 * KPA_PER_PSF),
    drainSize: METRES_PER_INCH,
    discharge: METRES_PER_FOOT ** 3,
    settlementM: METRES_PER_INCH,
  };
}
