/** ASTM D2487 group symbols, dual symbols included; peat is written "Pt". The bank tables use this list too. */
// biome-ignore format: coarse, dual-symbol coarse and fine groups on their own lines
export const USCS_SYMBOLS = [
  'GW', 'GP', 'GM', 'GC', 'GC-GM', 'GW-GM', 'GW-GC', 'GP-GM', 'GP-GC',
  'SW', 'SP', 'SM', 'SC', 'SC-SM', 'SW-SM', 'SW-SC', 'SP-SM', 'SP-SC',
  'CL', 'ML', 'OL', 'CH', 'MH', 'OH', 'CL-ML', 'Pt',
] as const;
export type UscsSymbol = (typeof USCS_SYMBOLS)[number];

const BY_UPPER = new Map<string, UscsSymbol>(USCS_SYMBOLS.map((s) => [s.toUpperCase(), s]));

/**
 * The group symbol as the bank writes it: case ignored ("pt", "PT" → "Pt"), "/" or spaces around the
 * hyphen accepted ("CL/ML" → "CL-ML"), and a dual symbol written the other way round put in ASTM order
 * ("ML-CL" → "CL-ML", "SM-SC" → "SC-SM"). Null when it is not a D2487 symbol.
 */
export function canonicalUscs(text: string): UscsSymbol | null {
  const key = text
    .trim()
    .toUpperCase()
    .replace(/\s*[-/–]\s*/g, '-');
  const direct = BY_UPPER.get(key);
  if (direct) return direct;
  const parts = key.split('-');
  return parts.length === 2 ? (BY_UPPER.get(`${parts[1]}-${parts[0]}`) ?? null) : null;
}
