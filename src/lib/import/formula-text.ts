/**
 * Text that a spreadsheet may run as a formula when it opens a CSV or workbook: a cell beginning with
 * = + - @, a tab, carriage return, line feed or NUL. The bank stores such text as typed; it is flagged
 * for the steward on import and neutralised on its way out of every export and download.
 * source: OWASP www-community, "CSV Injection" (the leading characters, and the advice to prefix such
 * a cell with a single quote); OWASP ASVS 5.0 §1.2.10 (adds NUL).
 */
const FORMULA_START = /^[=+\-@\t\r\n\0]/;

/** True when a spreadsheet may read the text as a formula. */
export function looksLikeFormula(text: string): boolean {
  return FORMULA_START.test(text);
}

/**
 * The text as it should be written into a CSV or spreadsheet text cell: unchanged, or with an
 * apostrophe in front when it looks like a formula, so the program shows it as text instead of running
 * it. For text cells only: numbers are written as numbers (a negative value must stay a number).
 */
export function neutraliseCell(text: string): string {
  return looksLikeFormula(text) ? `'${text}` : text;
}

/** The reason for an import flag on a shared text value that looks like a formula, or null. */
export function formulaFlagReason(label: string, text: string): string | null {
  if (!looksLikeFormula(text)) return null;
  const first = JSON.stringify(text.charAt(0));
  return `${label} begins with ${first}, which a spreadsheet may run as a formula; it is stored as typed and exported with a leading apostrophe.`;
}
