/**
 * CSV text for chart data: text cells go through the import core's neutraliseCell (a cell a spreadsheet
 * would run as a formula gets a leading apostrophe); numbers are written as numbers.
 */
import { neutraliseCell } from '../../lib/import/formula-text';

function cell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const safe = neutraliseCell(value);
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return `${[header, ...rows].map((row) => row.map(cell).join(',')).join('\r\n')}\r\n`;
}
