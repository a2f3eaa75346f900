/**
 * CSV text for chart data. A text cell that a spreadsheet would read as a formula (starting with
 * = + - @, a tab or a line break) is prefixed with an apostrophe; numbers are written as numbers.
 * Source: OWASP, "CSV Injection". One helper, to be swapped for the import core's neutraliseCell once
 * it is on main.
 */
export function neutraliseCell(text: string): string {
  return /^[=+\-@\t\r\n]/.test(text) ? `'${text}` : text;
}

function cell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const safe = neutraliseCell(value);
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return `${[header, ...rows].map((row) => row.map(cell).join(',')).join('\r\n')}\r\n`;
}
