/**
 * A readings file may hold both tables: the increments, then a line whose first cell is `[time readings]`,
 * then the time-readings table with its own header row. The split is made on whole rows (a quoted cell
 * may span lines) so that row numbers in both parts stay those a spreadsheet shows.
 */
export const TIME_READINGS_MARKER = '[time readings]';

export interface FileSections {
  increments: string;
  /** the time-readings part, and the spreadsheet row number of the marker line (rows after it are numbered on from it) */
  timeReadings: { text: string; markerRow: number } | null;
}

export function splitSections(text: string): FileSections {
  let row = 1;
  let start = 0;
  let inQuotes = false;
  for (let i = 0; i <= text.length; i++) {
    const c = text[i];
    if (c === '"') inQuotes = !inQuotes;
    const end = i === text.length || (!inQuotes && (c === '\n' || c === '\r'));
    if (!end) continue;
    if (firstCell(text.slice(start, i)) === TIME_READINGS_MARKER) {
      const next = c === '\r' && text[i + 1] === '\n' ? i + 2 : i + 1;
      return { increments: text.slice(0, start), timeReadings: { text: text.slice(next), markerRow: row } };
    }
    if (c === '\r' && text[i + 1] === '\n') i++;
    start = i + 1;
    row++;
  }
  return { increments: text, timeReadings: null };
}

function firstCell(line: string): string {
  const cell = line.split(/[,;\t]/, 1)[0] ?? '';
  return cell
    .trim()
    .replace(/^"(.*)"$/, '$1')
    .trim()
    .toLowerCase();
}
