// Text forms the service compares: facet values (trimmed, NFKD, lower-cased: case-insensitive but
// accent-sensitive, as the engine's facet filters are) and searchable words (accents removed too).

const COMBINING_MARKS = /\p{M}+/gu;
const WORD = /[\p{L}\p{N}]+/gu;

/** The form facet values and filter values are compared in. */
export function normalizeFacet(value: string): string {
  return value.trim().normalize('NFKD').toLowerCase();
}

/** Lower-cased with accents removed: the form searchable words are indexed and queried in. */
export function foldText(value: string): string {
  return value.normalize('NFKD').replace(COMBINING_MARKS, '').toLowerCase();
}

/** The words of a text, folded, in order. */
export function tokenize(value: string): string[] {
  return foldText(value).match(WORD) ?? [];
}

/** A number as the engine prints facet keys: shortest round-trip form, never in exponent notation. */
export function formatFacetNumber(value: number): string {
  if (Object.is(value, -0)) return '-0';
  const text = String(value);
  if (!/e/i.test(text)) return text;
  const [mantissa = '', exponentText = '0'] = text.toLowerCase().split('e');
  const exponent = Number(exponentText);
  const negative = mantissa.startsWith('-');
  const digits = mantissa.replace('-', '').replace('.', '');
  const pointAt = (mantissa.replace('-', '').indexOf('.') + 1 || mantissa.replace('-', '').length + 1) - 1 + exponent;
  let plain: string;
  if (pointAt <= 0) plain = `0.${'0'.repeat(-pointAt)}${digits}`;
  else if (pointAt >= digits.length) plain = digits + '0'.repeat(pointAt - digits.length);
  else plain = `${digits.slice(0, pointAt)}.${digits.slice(pointAt)}`;
  return (negative ? '-' : '') + plain;
}

const FLOAT = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A filter value read as a finite number the way the engine's parser does, or null. */
export function parseFiniteNumber(text: string): number | null {
  if (!FLOAT.test(text)) return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}
