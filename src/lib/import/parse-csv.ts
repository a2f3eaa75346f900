import { CsvReader, type CsvReadOptions } from './csv-reader';
import type { CsvTable } from './csv-table';
import { decodeText } from './decode';
import type { ImportResult } from './errors';

export type CsvParseResult = ImportResult<{ table: CsvTable; byteLength: number }>;

/**
 * Reads an uploaded CSV file (bytes, or text already decoded) into a header and rows. Never throws:
 * a file that cannot be read as a table gives `{ ok: false, error }` (codes EMPTY_FILE, TOO_LARGE,
 * BINARY_FILE, SPREADSHEET_FILE, UTF16_FILE, NOT_UTF8, DELIMITER_NOT_FOUND, DELIMITER_AMBIGUOUS,
 * DELIMITER_MISMATCH, HEADER_UNCLOSED_QUOTE, HEADER_EMPTY_NAME, HEADER_DUPLICATE_NAME, NO_ROWS,
 * TOO_MANY_ROWS); rows that read badly are kept and listed in `table.rowErrors`.
 */
export function parseCsv(input: Uint8Array | string, options: CsvReadOptions = {}): CsvParseResult {
  try {
    const decoded = decodeText(input);
    if (!decoded.ok) return decoded;
    const reader = new CsvReader(options);
    reader.push(decoded.text);
    const result = reader.finish();
    return result.ok ? { ok: true, table: result.table, byteLength: decoded.byteLength } : result;
  } catch {
    return {
      ok: false,
      error: { code: 'READ_FAILED', message: 'The file could not be read as CSV. Save it again as CSV UTF-8 and retry.' },
    };
  }
}
