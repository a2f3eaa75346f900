import type { NumberFieldKey } from './fields';

/**
 * The physical ranges a value must fall in, in the bank's SI units. A value outside is almost always a
 * unit mistake or a wrong column, so the message says how to check. Ranges marked common practice are
 * our own plausibility limits for oedometer tests on soil.
 */
export interface ValueRange {
  min?: number;
  /** the value must be greater than min, not equal to it */
  minExclusive?: boolean;
  max?: number;
  /** said after the message whichever way the value is out */
  hint?: string;
  /** said instead of `hint` when the value is too low, or too high */
  lowHint?: string;
  highHint?: string;
}

const DEPTH_HINT = ' If the column is in feet, choose ft as its unit.';
const STRESS_HINT = ' If the column is in psf or tsf, choose that unit.';

export const VALUE_RANGES: Readonly<Partial<Record<NumberFieldKey, ValueRange>>> = {
  // common practice: oedometer samples come from the top few hundred metres
  depthTop: { min: 0, max: 300, highHint: DEPTH_HINT },
  depthBottom: { min: 0, minExclusive: true, max: 300, highHint: DEPTH_HINT },
  latitude: { min: -90, max: 90 },
  longitude: { min: -180, max: 180 },
  waterContentPct: { min: 0, max: 1500, hint: ' Check the column holds the natural water content in %.' },
  liquidLimitPct: {
    min: 10,
    max: 500,
    lowHint: ' Enter LL in %; if the column holds fractions, multiply by 100.',
    highHint: ' Check the column holds LL in %.',
  },
  plasticLimitPct: { min: 0, max: 500, hint: ' Check the column holds PL in %.' },
  plasticityIndexPct: { min: 0, max: 500, hint: ' Check the column holds PI in %.' },
  // peat may go lower, see GS_MIN_ORGANIC
  specificGravity: { min: 1.5, max: 3.5, hint: ' Check the column holds Gs (about 2.6–2.8 for most mineral soils).' },
  bulkUnitWeight: {
    min: 8,
    max: 25,
    lowHint: ' If the column holds bulk density in Mg/m³, multiply it by 9.81 to get kN/m³.',
    highHint: ' If the column is in pcf, choose pcf as its unit.',
  },
  initialVoidRatio: { min: 0.2, max: 15, hint: ' Check the column holds the void ratio e0, not porosity or water content.' },
  organicContentPct: { min: 0, max: 100 },
  compressionIndex: { min: 0.01, max: 10, hint: ' Check the column holds Cc (change in void ratio per log cycle of stress).' },
  recompressionIndex: { min: 0, max: 10 },
  // common practice: oedometers on soil rarely pass 10 MPa
  preconsolidationStress: { min: 0, minExclusive: true, max: 10_000, highHint: STRESS_HINT },
  verticalEffectiveStress: { min: 0, max: 5000, highHint: STRESS_HINT },
  // common practice: OCR above 100 is not met in soils
  overconsolidationRatio: { min: 0.5, max: 100, hint: " Check OCR is σ'p ÷ σ'v0." },
  cvNc: { min: 0, minExclusive: true, max: 100_000, hint: ' Check the unit of the column (m²/yr, cm²/s, ft²/day or m²/s).' },
  cvOc: { min: 0, minExclusive: true, max: 100_000, hint: ' Check the unit of the column (m²/yr, cm²/s, ft²/day or m²/s).' },
  secondaryCompressionIndex: { min: 0, max: 1, hint: ' Check the column holds Cα (change in void ratio per log cycle of time).' },
  mv: { min: 0, minExclusive: true, max: 100, hint: ' Check the unit of the column (m²/MN, m²/kN or ft²/kip).' },
  permeability: { min: 0, minExclusive: true, max: 1, hint: ' Check the unit of the column (m/s, cm/s or ft/day).' },
  deltaEOverE0: { min: 0, max: 0.5, highHint: ' Enter Δe/e0 as a ratio (0.04), not in %.' },
};

/** Lowest Gs accepted for peat and organic soils (Pt, or organic content of 20 % or more); common practice. */
export const GS_MIN_ORGANIC = 1.2;
export const GS_ORGANIC_CONTENT_PCT = 20;

/** Heaviest soil unit weight used to bound σ'v0 by depth, kN/m³ (the top of the bulk unit weight range); common practice. */
export const MAX_SOIL_UNIT_WEIGHT = 25;
/** Slack on that bound for suction and rounding near the surface, kPa; common practice. */
export const OVERBURDEN_SLACK_KPA = 50;
/** How far a given OCR may differ from σ'p/σ'v0, as a fraction. */
export const OCR_TOLERANCE = 0.1;
/** How far a given PI may differ from LL − PL, in % points (rounding in lab sheets). */
export const PI_TOLERANCE_PCT = 1;

/** A number as people write it: up to 4 significant figures, thousands grouped; very small or large ones as 4.1e-10. */
export function formatValue(value: number): string {
  const size = Math.abs(value);
  if (size !== 0 && (size < 0.001 || size >= 1e9)) return Number(value.toPrecision(4)).toExponential();
  return value.toLocaleString('en-GB', { maximumSignificantDigits: 4 });
}

/** "10 to 500", "more than 0 up to 1", "0 or more" */
export function rangeText(range: ValueRange, unit: string): string {
  const u = unit ? ` ${unit}` : '';
  const low =
    range.min === undefined ? null : range.minExclusive ? `more than ${formatValue(range.min)}` : formatValue(range.min);
  const high = range.max === undefined ? null : formatValue(range.max);
  if (low && high) return range.minExclusive ? `${low} up to ${high}${u}` : `${low} to ${high}${u}`;
  if (low) return range.minExclusive ? `${low}${u}` : `${low}${u} or more`;
  return high ? `up to ${high}${u}` : 'any value';
}

/** 'low' or 'high' when the value is outside the range, null when inside. */
export function outsideRange(value: number, range: ValueRange): 'low' | 'high' | null {
  if (range.min !== undefined && (range.minExclusive ? value <= range.min : value < range.min)) return 'low';
  return range.max !== undefined && value > range.max ? 'high' : null;
}

/** The hint for a value that is too low or too high. */
export function rangeHint(range: ValueRange, side: 'low' | 'high'): string {
  return (side === 'low' ? range.lowHint : range.highHint) ?? range.hint ?? '';
}
