import {
  KN_PER_M3_PER_PCF,
  KPA_PER_PSF,
  M_PER_S_PER_FT_PER_DAY,
  M2_PER_MN_PER_FT2_PER_KIP,
  M2_PER_YEAR_PER_FT2_PER_DAY,
  METRES_PER_FOOT,
  METRES_PER_INCH,
} from './factors';

/**
 * Every figure shown to a person is stored in the bank's SI units and converted here, once, for the
 * person's unit system. `QuantityKind` names what a number measures; the unit label goes into the
 * column header or beside the value.
 */
export type DisplaySystem = 'SI' | 'US';

export type QuantityKind =
  | 'length'
  | 'settlement'
  | 'drainSize'
  | 'stress'
  | 'unitWeight'
  | 'cv'
  | 'mv'
  | 'permeability'
  | 'percent'
  | 'ratio'
  | 'time';

interface UnitPair {
  /** the bank's SI unit */
  si: string;
  us: string;
  /** multiply a value in the US unit by this to get the SI unit */
  usToSi: number;
}

/** SI storage units: length m, settlement m (shown in mm), drain size m (shown in mm), kPa, kN/m³, m²/yr, m²/MN, m/s. */
const UNITS: Readonly<Record<QuantityKind, UnitPair>> = {
  length: { si: 'm', us: 'ft', usToSi: METRES_PER_FOOT },
  settlement: { si: 'mm', us: 'in', usToSi: METRES_PER_INCH * 1000 },
  drainSize: { si: 'mm', us: 'in', usToSi: METRES_PER_INCH * 1000 },
  stress: { si: 'kPa', us: 'psf', usToSi: KPA_PER_PSF },
  unitWeight: { si: 'kN/m³', us: 'pcf', usToSi: KN_PER_M3_PER_PCF },
  cv: { si: 'm²/yr', us: 'ft²/day', usToSi: M2_PER_YEAR_PER_FT2_PER_DAY },
  mv: { si: 'm²/MN', us: 'ft²/kip', usToSi: M2_PER_MN_PER_FT2_PER_KIP },
  permeability: { si: 'm/s', us: 'ft/day', usToSi: M_PER_S_PER_FT_PER_DAY },
  percent: { si: '%', us: '%', usToSi: 1 },
  ratio: { si: '', us: '', usToSi: 1 },
  time: { si: 'years', us: 'years', usToSi: 1 },
};

/**
 * Settlement and drain sizes are stored in metres but shown in mm (SI) or inches (US): the SI value
 * passed in is in metres for these two kinds.
 */
const SI_STORAGE_SCALE: Partial<Record<QuantityKind, number>> = { settlement: 1000, drainSize: 1000 };

/** The unit a kind is shown in ('' for a ratio). */
export function unitLabel(kind: QuantityKind, system: DisplaySystem): string {
  return system === 'SI' ? UNITS[kind].si : UNITS[kind].us;
}

/** A stored SI value in the person's unit system. */
export function fromSi(valueSi: number, kind: QuantityKind, system: DisplaySystem): number {
  const shown = valueSi * (SI_STORAGE_SCALE[kind] ?? 1);
  return system === 'SI' ? shown : shown / UNITS[kind].usToSi;
}

/** A value typed in the person's unit system, back in the bank's SI storage unit. */
export function toSi(value: number, kind: QuantityKind, system: DisplaySystem): number {
  const shown = system === 'SI' ? value : value * UNITS[kind].usToSi;
  return shown / (SI_STORAGE_SCALE[kind] ?? 1);
}

const FORMATS = new Map<number, Intl.NumberFormat>();
function formatter(significant: number): Intl.NumberFormat {
  let format = FORMATS.get(significant);
  if (!format) {
    format = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: significant });
    FORMATS.set(significant, format);
  }
  return format;
}

/**
 * A figure as text in the person's units, to three significant figures unless told otherwise (one rule
 * for every ratio, index and parameter, so OCR, Cc and cv read alike everywhere). Null shows as an em dash.
 */
export function formatQuantity(
  valueSi: number | null | undefined,
  kind: QuantityKind,
  system: DisplaySystem,
  options: { significant?: number; withUnit?: boolean } = {},
): string {
  if (valueSi === null || valueSi === undefined || !Number.isFinite(valueSi)) return '—';
  const text = formatter(options.significant ?? 3).format(fromSi(valueSi, kind, system));
  const unit = unitLabel(kind, system);
  return options.withUnit && unit ? `${text} ${unit}` : text;
}

/** "Cc" → "Cc"; "σ'p" with kPa → "σ'p (kPa)": a column header naming its unit. */
export function headerWithUnit(label: string, kind: QuantityKind, system: DisplaySystem): string {
  const unit = unitLabel(kind, system);
  return unit ? `${label} (${unit})` : label;
}
