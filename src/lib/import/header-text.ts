import { isUnitLike, parseUnit } from './units';

const GREEK: Readonly<Record<string, string>> = {
  σ: 'sigma',
  ς: 'sigma',
  α: 'alpha',
  δ: 'delta',
  γ: 'gamma',
  ε: 'epsilon',
  ρ: 'rho',
  φ: 'phi',
};

/**
 * A header or synonym reduced for matching: Greek letters spelt out (σ → sigma, α → alpha, Δ → delta),
 * accents and sub/superscripts folded (e₀ → e0, m² → m2), lower case, and everything but letters and
 * digits dropped ("σ'p" and "Sigma p" both give "sigmap").
 */
export function normaliseName(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[σςαδγερφ]/g, (c) => GREEK[c] ?? c)
    .replace(/[^a-z0-9]/g, '');
}

const BRACKETS = /\(([^()]*)\)|\[([^[\]]*)\]|\{([^{}]*)\}/g;

export interface HeaderParts {
  /** the header without bracketed units ("cv (OC range) (m²/yr)" → "cv (OC range)") */
  withoutUnits: string;
  /** the header without any bracketed text ("cv") */
  bare: string;
  /** the header with a trailing unit word removed ("Depth top m" → "Depth top"), or null */
  withoutTrailingUnit: string | null;
  /** the unit written in the header (the last bracketed unit, or a trailing unit word), or null */
  unitText: string | null;
}

/** Splits a header into its name and any unit written with it, in brackets or as a last word. */
export function headerParts(header: string): HeaderParts {
  let unitText: string | null = null;
  const withoutUnits = header
    .replace(BRACKETS, (whole, a?: string, b?: string, c?: string) => {
      const inner = (a ?? b ?? c ?? '').trim();
      if (!isUnitLike(inner)) return whole;
      if (parseUnit(inner)) unitText = inner;
      return ' ';
    })
    .trim();
  const bare = withoutUnits.replace(BRACKETS, ' ').trim();
  const words = bare.split(/[\s_,;]+/).filter((w) => w !== '');
  const last = words.at(-1);
  let withoutTrailingUnit: string | null = null;
  if (words.length >= 2 && last !== undefined && parseUnit(last)) {
    withoutTrailingUnit = words.slice(0, -1).join(' ');
    unitText ??= last;
  }
  return { withoutUnits, bare, withoutTrailingUnit, unitText };
}

/** The key a remembered mapping is stored under: the header trimmed, lower case, single spaces. */
export function rememberKey(header: string): string {
  return header.trim().toLowerCase().replace(/\s+/g, ' ');
}
