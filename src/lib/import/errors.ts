import { fieldName } from './field-labels';

/**
 * The importer's one error shape. A file-level error stops the import (the file cannot be read as a
 * table); a row error names the row (and field) a person must fix. Codes are stable: the server maps
 * them to HTTP statuses (in its error mapper) and the browser may branch on them; messages are plain
 * English for people.
 */
export const IMPORT_ERROR_CODES = [
  'EMPTY_FILE',
  'TOO_LARGE',
  'BINARY_FILE',
  'SPREADSHEET_FILE',
  'UTF16_FILE',
  'NOT_UTF8',
  'DELIMITER_NOT_FOUND',
  'DELIMITER_AMBIGUOUS',
  'DELIMITER_MISMATCH',
  'HEADER_UNCLOSED_QUOTE',
  'HEADER_EMPTY_NAME',
  'HEADER_DUPLICATE_NAME',
  'NO_ROWS',
  'TOO_MANY_ROWS',
  'BAD_MAPPING',
  'NOT_AGS4',
  'AGS4_MALFORMED',
  'AGS4_UNKNOWN_UNIT',
  'AGS4_NO_TESTS',
  'READ_FAILED',
] as const;
export type ImportErrorCode = (typeof IMPORT_ERROR_CODES)[number];

/** Where in the file a file-level problem sits (AGS4 structure errors list every offending line). */
export interface ImportIssue {
  /** 1-based line of the file */
  line: number;
  message: string;
}

export interface ImportError {
  code: ImportErrorCode;
  message: string;
  issues?: readonly ImportIssue[];
}

/**
 * A problem with one row. `row` follows the importer's numbering (see `row-numbers.ts`); `field` is an
 * import field key, 'increments' for the consolidation increments, or null when the whole row is at fault.
 */
export interface RowError {
  row: number;
  field: string | null;
  message: string;
}

/** Either a value or a file-level error; importer functions return this instead of throwing. */
export type ImportResult<T> = ({ ok: true } & T) | { ok: false; error: ImportError };

export function importError(code: ImportErrorCode, message: string, issues?: readonly ImportIssue[]): ImportError {
  return issues && issues.length > 0 ? { code, message, issues } : { code, message };
}

export function failure(
  code: ImportErrorCode,
  message: string,
  issues?: readonly ImportIssue[],
): { ok: false; error: ImportError } {
  return { ok: false, error: importError(code, message, issues) };
}

/** "Row 14: …" or "Row 14, LL: …" for lists shown to people (field keys shown by their names). */
export function formatRowError(error: RowError, fieldLabel: (field: string) => string = fieldName): string {
  const field = error.field ? `, ${fieldLabel(error.field)}` : '';
  return `Row ${error.row}${field}: ${error.message}`;
}
