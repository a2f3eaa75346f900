import type { AgsValues } from './ags4-values';

/** One GEOL stratum of a hole: depths in m and its geology codes (GEOL_GEOL, then GEOL_GEO2). */
export interface Layer {
  top: number;
  base: number;
  codes: string[];
}

/** The strata of each hole (LOCA_ID), from GEOL records that have both depths and a code. */
export function geologyLayers(records: readonly AgsValues[]): Map<string, Layer[]> {
  const byHole = new Map<string, Layer[]>();
  for (const v of records) {
    const top = v.number('GEOL_TOP');
    const base = v.number('GEOL_BASE');
    const codes = [v.text('GEOL_GEOL'), v.text('GEOL_GEO2')].filter((c): c is string => c !== null);
    if (top === null || base === null || codes.length === 0) continue;
    const hole = v.text('LOCA_ID') ?? '';
    byHole.set(hole, [...(byHole.get(hole) ?? []), { top, base, codes }]);
  }
  return byHole;
}

/** The unit of the stratum holding `depth` (its top included, its base only for the deepest stratum). */
export function geologyAt(
  layers: readonly Layer[],
  depth: number | null,
  map: Readonly<Record<string, string>> = {},
): string | null {
  if (depth === null) return null;
  const deepest = Math.max(...layers.map((l) => l.base));
  const layer = layers.find((l) => depth >= l.top && (depth < l.base || (depth === l.base && l.base === deepest)));
  if (!layer) return null;
  const mapped = layer.codes.find((c) => Object.hasOwn(map, c));
  return mapped !== undefined ? (map[mapped] ?? null) : (layer.codes[0] ?? null);
}
