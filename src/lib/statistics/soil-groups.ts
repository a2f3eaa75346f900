/**
 * Broad soil groups from ASTM D2487 group symbols, as the published correlations state their
 * validity (inorganic clays and silts, organic clays and silts, peat, coarse-grained soils).
 * Stored per row as a small code: 0 unknown.
 */

export const SOIL_GROUPS = ['inorganic', 'organic', 'peat', 'coarse'] as const;
export type SoilGroup = (typeof SOIL_GROUPS)[number];

/** Row code of each group (index + 1); 0 means the group is not known. */
export const SOIL_GROUP_CODE: Readonly<Record<SoilGroup, number>> = { inorganic: 1, organic: 2, peat: 3, coarse: 4 };
export const UNKNOWN_SOIL_GROUP_CODE = 0;

/**
 * The group of an ASTM D2487 symbol: CL, ML, CH, MH, CL-ML inorganic fine-grained; OL, OH organic;
 * Pt peat; any G… or S… symbol coarse-grained. Null for a missing or unknown symbol.
 */
export function soilGroupOfUscs(symbol: string | null | undefined): SoilGroup | null {
  if (!symbol) return null;
  if (symbol === 'Pt') return 'peat';
  if (symbol === 'OL' || symbol === 'OH') return 'organic';
  if (symbol === 'CL' || symbol === 'ML' || symbol === 'CH' || symbol === 'MH' || symbol === 'CL-ML') return 'inorganic';
  if (/^[GS][WPMC](-[GS][WPMC])?$/.test(symbol)) return 'coarse';
  return null;
}

export function soilGroupCode(group: SoilGroup | null): number {
  return group === null ? UNKNOWN_SOIL_GROUP_CODE : SOIL_GROUP_CODE[group];
}
