import { failure, type ImportResult } from './errors';

/** The delimiters a contributor's CSV may use. */
export const DELIMITERS = [',', ';', '\t'] as const;
export type Delimiter = (typeof DELIMITERS)[number];
export type Newline = '\r\n' | '\n' | '\r';

export const DELIMITER_NAMES: Readonly<Record<Delimiter, string>> = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' };

export function isDelimiter(value: unknown): value is Delimiter {
  return typeof value === 'string' && (DELIMITERS as readonly string[]).includes(value);
}

const QUOTE = 34;
const LF = 10;
const CR = 13;
const FIELD_STARTERS = new Set([44, 59, 9]);

/**
 * Walks the text as a CSV reader would before the delimiter is known: a quote opens a quoted cell only at
 * the start of a cell (after any candidate delimiter or a line break), `""` inside is an escaped quote, and
 * a quote elsewhere is a literal character. Calls `visit` with each character code outside quoted cells and
 * stops when `visit` returns true; returns that index, or -1 when the text ran out (`open` tells whether a
 * quoted cell was still open).
 */
function scanOutsideQuotes(text: string, visit: (code: number, index: number) => boolean): { stop: number; open: boolean } {
  let inQuotes = false;
  let cellStart = true;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inQuotes) {
      if (c === QUOTE) {
        if (text.charCodeAt(i + 1) === QUOTE) i++;
        else inQuotes = false;
      }
      continue;
    }
    if (c === QUOTE && cellStart) {
      inQuotes = true;
      cellStart = false;
      continue;
    }
    if (visit(c, i)) return { stop: i, open: false };
    cellStart = FIELD_STARTERS.has(c) || c === LF || c === CR;
  }
  return { stop: -1, open: inQuotes };
}

/**
 * Where the header row ends: the first line break outside quoted cells, or null when the text so far holds
 * no complete header row. `next` is where the first data row starts.
 */
export function findHeaderEnd(text: string): { end: number; next: number; newline: Newline } | null {
  const { stop } = scanOutsideQuotes(text, (c) => c === LF || c === CR);
  if (stop < 0) return null;
  if (text.charCodeAt(stop) === LF) return { end: stop, next: stop + 1, newline: '\n' };
  if (stop + 1 >= text.length) return null;
  return text.charCodeAt(stop + 1) === LF
    ? { end: stop, next: stop + 2, newline: '\r\n' }
    : { end: stop, next: stop + 1, newline: '\r' };
}

/** How often each delimiter appears in the header row outside quoted cells. */
export function countDelimiters(headerLine: string): Record<Delimiter, number> {
  const counts: Record<Delimiter, number> = { ',': 0, ';': 0, '\t': 0 };
  scanOutsideQuotes(headerLine, (c) => {
    if (c === 44) counts[',']++;
    else if (c === 59) counts[';']++;
    else if (c === 9) counts['\t']++;
    return false;
  });
  return counts;
}

/** True when a quoted cell in the header row is never closed. */
export function hasUnclosedQuote(headerLine: string): boolean {
  return scanOutsideQuotes(headerLine, () => false).open;
}

/**
 * Decides the delimiter from the header row alone: the candidate found most often outside quotes wins,
 * provided it makes at least two columns and no other candidate is found as often. Otherwise the person
 * is asked to choose. A delimiter the person chose is checked against the header instead.
 */
export function chooseDelimiter(headerLine: string, chosen?: Delimiter): ImportResult<{ delimiter: Delimiter }> {
  const counts = countDelimiters(headerLine);
  if (chosen) {
    if (counts[chosen] > 0) return { ok: true, delimiter: chosen };
    const likely = DELIMITERS.find((d) => counts[d] > 0);
    const hint = likely ? ` It seems to use ${DELIMITER_NAMES[likely]}; choose that instead.` : '';
    return failure('DELIMITER_MISMATCH', `Split by ${DELIMITER_NAMES[chosen]}, the header row gives only one column.${hint}`);
  }
  const ranked = [...DELIMITERS].sort((a, b) => counts[b] - counts[a]);
  const [best, second] = ranked as [Delimiter, Delimiter, Delimiter];
  if (counts[best] === 0) {
    return failure(
      'DELIMITER_NOT_FOUND',
      'The header row has no commas, semicolons or tabs between column names, so the columns cannot be told apart. Check that this is a CSV file with a header row, or choose the delimiter yourself.',
    );
  }
  if (counts[second] === counts[best]) {
    return failure(
      'DELIMITER_AMBIGUOUS',
      `The header row has as many ${DELIMITER_NAMES[best]} as ${DELIMITER_NAMES[second]}, so the delimiter is unclear. Choose the delimiter the file uses.`,
    );
  }
  return { ok: true, delimiter: best };
}
