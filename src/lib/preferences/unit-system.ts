/** Unit systems a person can work in: SI inside the engine, US customary converted at the edge. */
export const UNIT_SYSTEMS = ['SI', 'US'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const UNIT_SYSTEM_COOKIE = 'claybank_units';
export const DEFAULT_UNIT_SYSTEM: UnitSystem = 'SI';

export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = {
  SI: 'SI (m, kPa, m²/yr)',
  US: 'US customary (ft, psf, ft²/day)',
};

export function isUnitSystem(value: unknown): value is UnitSystem {
  return typeof value === 'string' && (UNIT_SYSTEMS as readonly string[]).includes(value);
}

/** The unit system a cookie value names, or the default when it names none. */
export function unitSystemFromCookie(value: string | undefined): UnitSystem {
  return isUnitSystem(value) ? value : DEFAULT_UNIT_SYSTEM;
}
