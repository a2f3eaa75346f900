import type { Delimiter, Newline } from './delimiter';
import type { RowError } from './errors';

/** One data row as read from the file: the cells as text, one per header column. */
export interface CsvRow {
  /** spreadsheet row number (header = 1, first data row = 2; see row-numbers.ts) */
  row: number;
  cells: string[];
}

/** A CSV file read into a header and rows, before any column is matched to a field. */
export interface CsvTable {
  /** header cells as written in the file */
  headers: string[];
  rows: CsvRow[];
  /** rows that could not be read cleanly (quotes, cell counts); those rows are still in `rows` */
  rowErrors: RowError[];
  delimiter: Delimiter;
  newline: Newline;
}

/** Spreadsheet column letter for a 0-based column index (0 → A, 26 → AA). */
export function columnLetter(index: number): string {
  let n = index + 1;
  let letters = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    letters = String.fromCharCode(65 + r) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** "column 3 (C)" */
export function columnName(index: number): string {
  return `column ${index + 1} (${columnLetter(index)})`;
}
