import type Papa from 'papaparse';
import { columnName } from './csv-table';
import { type ImportError, importError } from './errors';

/** A file-level error for an empty or repeated header name, or null when the header is usable. */
export function headerProblem(headers: readonly string[]): ImportError | null {
  const seen = new Map<string, number>();
  for (const [i, raw] of headers.entries()) {
    const name = raw.trim();
    if (name === '') {
      return importError(
        'HEADER_EMPTY_NAME',
        `The header row has no name in ${columnName(i)}. Name the column, or delete it if it holds nothing.`,
      );
    }
    const key = name.toLowerCase();
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      return importError(
        'HEADER_DUPLICATE_NAME',
        `The header row names ${columnName(earlier)} and ${columnName(i)} both "${name}". Rename one so each column has its own name.`,
      );
    }
    seen.set(key, i);
  }
  return null;
}

/** A plain message for a papaparse quote error on one row. */
export function quoteMessage(error: Papa.ParseError): string {
  if (error.code === 'MissingQuotes') {
    return 'a quote is opened but never closed; check for a stray " in this row. Everything after it was read as one cell.';
  }
  if (error.code === 'InvalidQuotes') {
    return 'a quoted cell has text after its closing quote. Put the whole cell in quotes and double any quote inside it ("").';
  }
  return 'this row could not be read; check its quotes and delimiters.';
}

/** A plain message for a row whose cell count differs from the header's. */
export function cellCountMessage(found: number, expected: number): string {
  const hint =
    found > expected
      ? ' Check for a delimiter inside a cell that is not in quotes (for example a decimal comma in a comma-separated file).'
      : ' Check for a missing delimiter or a line break inside a cell that is not in quotes.';
  return `this row has ${found} cells but the header has ${expected} columns.${hint}`;
}
