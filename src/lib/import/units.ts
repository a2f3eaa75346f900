import type { UnitKind } from './fields';

/**
 * Units a column may be written in, per unit kind, and their factors to the bank's SI units
 * (depth m, stress kPa, cv m²/yr, unit weight kN/m³, mv m²/MN, k m/s). Exact definitions:
 * 1 ft = 0.3048 m and 1 lbf = 4.4482216152605 N (NIST SP 811 (2008), Appendix B); the year for cv is the
 * Julian year of 365.25 days (common practice for cv in m²/yr).
 */
export const METRES_PER_FOOT = 0.3048;
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
export const SECONDS_PER_YEAR = 365.25 * 24 * 3600;
const SQUARE_FEET_IN_M2 = METRES_PER_FOOT * METRES_PER_FOOT;
/** 1 psf (lbf/ft²) in kPa, ≈ 0.0478802589803 */
export const KPA_PER_PSF = NEWTONS_PER_POUND_FORCE / SQUARE_FEET_IN_M2 / 1000;
/** 1 tsf (short ton-force, 2000 lbf, per ft²) in kPa, ≈ 95.7605 */
export const KPA_PER_TSF = 2000 * KPA_PER_PSF;
/** 1 pcf (lbf/ft³) in kN/m³, ≈ 0.157087463 */
export const KN_PER_M3_PER_PCF = NEWTONS_PER_POUND_FORCE / METRES_PER_FOOT ** 3 / 1000;
/** 1 cm²/s in m²/yr, = 3155.76 */
export const M2_PER_YEAR_PER_CM2_PER_S = 1e-4 * SECONDS_PER_YEAR;
/** 1 ft²/day in m²/yr, ≈ 33.93 */
export const M2_PER_YEAR_PER_FT2_PER_DAY = SQUARE_FEET_IN_M2 * 365.25;
/** 1 ft²/kip in m²/MN, ≈ 20.885 */
export const M2_PER_MN_PER_FT2_PER_KIP = (SQUARE_FEET_IN_M2 / (1000 * NEWTONS_PER_POUND_FORCE)) * 1e6;
/** 1 ft/day in m/s, ≈ 3.5278e-6 */
export const M_PER_S_PER_FT_PER_DAY = METRES_PER_FOOT / 86_400;

export type MeasuredKind = Exclude<UnitKind, 'none'>;

export interface UnitChoice {
  id: string;
  /** as shown to people */
  label: string;
  /** multiply a value in this unit by this to get the bank's SI unit */
  toSi: number;
  /** spellings recognised in headers and AGS4 UNIT lines (compared after `unitKey`) */
  aliases: readonly string[];
}

const choice = (id: string, label: string, toSi: number, aliases: readonly string[]): UnitChoice => ({
  id,
  label,
  toSi,
  aliases,
});

/** The choices per kind; the first is the bank's SI unit. */
export const UNIT_CHOICES: Readonly<Record<MeasuredKind, readonly UnitChoice[]>> = {
  length: [
    choice('m', 'm', 1, ['m', 'metre', 'metres', 'meter', 'meters', 'mbgl']),
    choice('ft', 'ft', METRES_PER_FOOT, ['ft', 'feet', 'foot', 'ftbgl']),
  ],
  stress: [
    choice('kPa', 'kPa', 1, ['kpa', 'kn/m2']),
    choice('psf', 'psf', KPA_PER_PSF, ['psf', 'lb/ft2', 'lbf/ft2', 'lbs/ft2']),
    choice('tsf', 'tsf', KPA_PER_TSF, ['tsf', 'ton/ft2', 'tons/ft2', 'tonf/ft2']),
    choice('MPa', 'MPa', 1000, ['mpa', 'mn/m2', 'n/mm2']),
  ],
  cv: [
    choice('m2/yr', 'm²/yr', 1, ['m2/yr', 'm2/year', 'm2/y', 'm2/a', 'm2/annum']),
    choice('cm2/s', 'cm²/s', M2_PER_YEAR_PER_CM2_PER_S, ['cm2/s', 'cm2/sec']),
    choice('ft2/day', 'ft²/day', M2_PER_YEAR_PER_FT2_PER_DAY, ['ft2/day', 'ft2/d', 'sqft/day']),
    choice('m2/s', 'm²/s', SECONDS_PER_YEAR, ['m2/s', 'm2/sec']),
  ],
  unitWeight: [choice('kN/m3', 'kN/m³', 1, ['kn/m3']), choice('pcf', 'pcf', KN_PER_M3_PER_PCF, ['pcf', 'lb/ft3', 'lbf/ft3'])],
  mv: [
    choice('m2/MN', 'm²/MN', 1, ['m2/mn', '1/mpa', 'mpa-1', '/mpa']),
    choice('m2/kN', 'm²/kN', 1000, ['m2/kn', '1/kpa', 'kpa-1', '/kpa']),
    choice('ft2/kip', 'ft²/kip', M2_PER_MN_PER_FT2_PER_KIP, ['ft2/kip', '1/ksf', 'ksf-1']),
  ],
  permeability: [
    choice('m/s', 'm/s', 1, ['m/s', 'm/sec']),
    choice('cm/s', 'cm/s', 0.01, ['cm/s', 'cm/sec']),
    choice('ft/day', 'ft/day', M_PER_S_PER_FT_PER_DAY, ['ft/day', 'ft/d']),
  ],
};

/** Spellings meaning "no unit" or a percentage, which a header may carry in brackets. */
const UNITLESS = new Set(['%', 'percent', '-', '–', '—', 'none', 'dimensionless', 'ratio', '']);

/** Lower-case, no spaces, superscripts as digits, "per" as "/". */
export function unitKey(text: string): string {
  return text
    .normalize('NFKC')
    .toLowerCase()
    .replace(/\s+per\s+/g, '/')
    .replace(/\s+/g, '')
    .replace(/\^/g, '')
    .replace(/sq\.?ft/g, 'sqft');
}

export function isMeasuredKind(kind: UnitKind): kind is MeasuredKind {
  return kind !== 'none';
}

/** The bank's SI unit id for a kind, or null for a unitless field. */
export function siUnit(kind: UnitKind): string | null {
  return isMeasuredKind(kind) ? (UNIT_CHOICES[kind][0]?.id ?? null) : null;
}

export function unitChoice(kind: UnitKind, id: string | null | undefined): UnitChoice | null {
  if (!isMeasuredKind(kind) || id == null) return null;
  return UNIT_CHOICES[kind].find((c) => c.id === id) ?? null;
}

/** Recognises a written unit ("ft", "m²/yr", "lb/ft3") for any kind: the kind and choice, or null. */
export function parseUnit(text: string): { kind: MeasuredKind; unit: UnitChoice } | null {
  const key = unitKey(text);
  for (const kind of Object.keys(UNIT_CHOICES) as MeasuredKind[]) {
    const unit = UNIT_CHOICES[kind].find((c) => c.aliases.includes(key));
    if (unit) return { kind, unit };
  }
  return null;
}

/** True for a bracketed header suffix that is a unit, a percent sign or a "no unit" mark. */
export function isUnitLike(text: string): boolean {
  return UNITLESS.has(unitKey(text)) || parseUnit(text) !== null;
}

/** A value in `unitId` of `kind`, in the bank's SI unit. An unknown unit leaves the value as it is. */
export function toSi(value: number, kind: UnitKind, unitId: string | null | undefined): number {
  const unit = unitChoice(kind, unitId);
  return unit ? value * unit.toSi : value;
}
