import Papa from 'papaparse';
import { cellCountMessage, headerProblem, quoteMessage } from './csv-messages';
import type { CsvRow, CsvTable } from './csv-table';
import { chooseDelimiter, type Delimiter, findHeaderEnd, hasUnclosedQuote, type Newline } from './delimiter';
import { type ImportError, type ImportResult, importError, type RowError } from './errors';
import { MAX_ROWS } from './limits';
import { FIRST_DATA_ROW_NUMBER } from './row-numbers';

export interface CsvReadOptions {
  /** the delimiter the person chose; when absent it is decided from the header row */
  delimiter?: Delimiter;
  /** the most data rows accepted (default MAX_ROWS) */
  maxRows?: number;
}

/**
 * Reads CSV text given in pieces (the whole file at once, or decoded slices of it) into a CsvTable. The
 * header row is read on its own to decide the delimiter and line break; the rows are then parsed by
 * papaparse with both set explicitly, one piece at a time, carrying an unfinished last row over to the
 * next piece (the same call papaparse's own chunked streaming makes). Blank rows (only spaces and
 * delimiters) are skipped but counted, so row numbers match a spreadsheet.
 */
export class CsvReader {
  private readonly options: CsvReadOptions;
  private pending = '';
  private headers: string[] | null = null;
  private delimiter: Delimiter = ',';
  private newline: Newline = '\n';
  private partial = '';
  private nextRow = FIRST_DATA_ROW_NUMBER;
  private readonly rows: CsvRow[] = [];
  private readonly rowErrors: RowError[] = [];
  private error: ImportError | null = null;

  constructor(options: CsvReadOptions = {}) {
    this.options = options;
  }

  /** Data rows read so far. */
  get rowCount(): number {
    return this.rows.length;
  }

  /** The file-level error met so far, if any (reading stops at the first). */
  get failed(): ImportError | null {
    return this.error;
  }

  /** Adds the next piece of text. */
  push(text: string): void {
    if (this.error) return;
    if (this.headers !== null) {
      this.parseRows(text, false);
      return;
    }
    this.pending += text;
    const end = findHeaderEnd(this.pending);
    if (!end) return;
    const pending = this.pending;
    this.pending = '';
    if (this.readHeader(pending.slice(0, end.end), end.newline)) this.parseRows(pending.slice(end.next), false);
  }

  /** Ends the input and returns the table, or the file-level error that stopped it. */
  finish(): ImportResult<{ table: CsvTable }> {
    if (!this.error && this.headers === null) {
      const newline: Newline = this.pending.endsWith('\r\n') ? '\r\n' : this.pending.endsWith('\r') ? '\r' : '\n';
      this.readHeader(this.pending.replace(/(\r\n|\n|\r)$/, ''), newline);
      this.pending = '';
    } else if (!this.error) this.parseRows('', true);
    if (this.error) return { ok: false, error: this.error };
    if (this.rows.length === 0) {
      return {
        ok: false,
        error: importError('NO_ROWS', 'The file has a header row but no data rows. Add one row per test below the header.'),
      };
    }
    return {
      ok: true,
      table: {
        headers: this.headers ?? [],
        rows: this.rows,
        rowErrors: this.rowErrors,
        delimiter: this.delimiter,
        newline: this.newline,
      },
    };
  }

  private readHeader(line: string, newline: Newline): boolean {
    if (hasUnclosedQuote(line)) {
      this.error = importError(
        'HEADER_UNCLOSED_QUOTE',
        'The header row (row 1) has a quote that is never closed. Remove the stray " or close the quoted name.',
      );
      return false;
    }
    const chosen = chooseDelimiter(line, this.options.delimiter);
    if (!chosen.ok) {
      this.error = chosen.error;
      return false;
    }
    this.delimiter = chosen.delimiter;
    this.newline = newline;
    const parsed = new Papa.Parser({ delimiter: this.delimiter, newline }).parse(line, 0, false) as { data: string[][] };
    const headers = parsed.data[0] ?? [];
    const problem = headerProblem(headers);
    if (problem) {
      this.error = problem;
      return false;
    }
    this.headers = headers;
    return true;
  }

  private parseRows(text: string, final: boolean): void {
    if (this.error || this.headers === null) return;
    const input = this.partial + text;
    this.partial = '';
    if (input.length === 0) return;
    const parser: Papa.Parser = new Papa.Parser({
      delimiter: this.delimiter,
      newline: this.newline,
      step: (result: { data: string[][]; errors: Papa.ParseError[] }) => {
        if (!this.takeRecord(result.data[0] ?? [''], result.errors)) parser.abort();
      },
    });
    const result = parser.parse(input, 0, !final) as { meta: { cursor: number } };
    if (!final && !this.error) this.partial = input.slice(result.meta.cursor);
  }

  private takeRecord(cells: string[], errors: readonly Papa.ParseError[]): boolean {
    const row = this.nextRow++;
    if (errors.length === 0 && isBlank(cells)) return true;
    const headers = this.headers ?? [];
    const maxRows = this.options.maxRows ?? MAX_ROWS;
    if (this.rows.length >= maxRows) {
      this.error = importError(
        'TOO_MANY_ROWS',
        `The file has more than ${maxRows.toLocaleString('en-GB')} data rows; split it into files of at most ${maxRows.toLocaleString('en-GB')} rows.`,
      );
      return false;
    }
    for (const message of new Set(errors.map(quoteMessage))) this.rowErrors.push({ row, field: null, message });
    let kept = cells;
    if (cells.length > headers.length) {
      if (errors.length === 0 && cells.slice(headers.length).some((c) => c.trim() !== '')) {
        this.rowErrors.push({ row, field: null, message: cellCountMessage(cells.length, headers.length) });
      }
      kept = cells.slice(0, headers.length);
    } else if (cells.length < headers.length) {
      if (errors.length === 0) this.rowErrors.push({ row, field: null, message: cellCountMessage(cells.length, headers.length) });
      kept = [...cells, ...Array<string>(headers.length - cells.length).fill('')];
    }
    this.rows.push({ row, cells: kept });
    return true;
  }
}

function isBlank(cells: readonly string[]): boolean {
  for (const c of cells) if (c.trim() !== '') return false;
  return true;
}
