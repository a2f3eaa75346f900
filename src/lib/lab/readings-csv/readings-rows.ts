import type { CsvTable } from '../../import/csv-table';
import type { RowError } from '../../import/errors';
import { parseNumberCell } from '../../import/parse-number';
import { shown } from '../outcome';
import type { HeaderMatch } from './readings-headers';

export type ReadingsSection = 'increments' | 'time readings';

/** A row error that also says which table it is in (row numbers are the spreadsheet's, see row-numbers.ts). */
export interface ReadingsRowError extends RowError {
  section: ReadingsSection;
}

export interface ValuesRow {
  row: number;
  values: Record<string, string | number | null>;
  /** fields whose cell could not be read as a number (already reported) */
  unreadable: string[];
}

/** common practice (our own plausibility limits for an oedometer test; outside them a unit or column is wrong) */
export const READINGS_LIMITS: Readonly<Record<string, { min: number; max: number; minExclusive?: boolean }>> = {
  stressKpa: { min: 0, max: 100_000 },
  deformationMm: { min: -50, max: 100 },
  voidRatio: { min: 0, max: 20, minExclusive: true },
  initialHeightMm: { min: 5, max: 200 },
  diameterMm: { min: 10, max: 300 },
  waterContentPct: { min: 0, max: 1500 },
  specificGravity: { min: 1, max: 3.5 },
  dryMassG: { min: 0, max: 10_000, minExclusive: true },
  initialVoidRatio: { min: 0, max: 20, minExclusive: true },
  elapsedMin: { min: 0, max: 100_000 },
};

/**
 * The cells of each row as values: text trimmed (blank → null), numbers read as the importer reads them
 * (a decimal comma only in semicolon- or tab-separated files) and converted to the core's units, then
 * checked against READINGS_LIMITS. Row numbers are shifted by `rowOffset` (the rows of the file before
 * this table). The table's own read problems are reported too.
 */
export function rowValues(
  table: CsvTable,
  match: HeaderMatch,
  section: ReadingsSection,
  rowOffset: number,
  errors: ReadingsRowError[],
): ValuesRow[] {
  for (const e of table.rowErrors) errors.push({ ...e, row: e.row + rowOffset, section });
  const decimalComma = table.delimiter !== ',';
  return table.rows.map(({ row: tableRow, cells }) => {
    const row = tableRow + rowOffset;
    const values: Record<string, string | number | null> = {};
    const unreadable: string[] = [];
    for (const [i, field] of match.fields.entries()) {
      if (!field) continue;
      const text = (cells[i] ?? '').trim();
      if (field.type === 'text') {
        values[field.key] = text === '' ? null : text;
        continue;
      }
      const parsed = parseNumberCell(text, { decimalComma, percent: field.kind === 'percent' });
      if (!parsed.ok) {
        errors.push({ row, field: field.key, message: `${field.label}: ${parsed.message}`, section });
        unreadable.push(field.key);
        continue;
      }
      const value = parsed.value === null ? null : parsed.value * (match.factors[i] ?? 1);
      values[field.key] = value;
      if (value === null) continue;
      if (field.type === 'integer' && !(Number.isInteger(value) && value >= 1)) {
        errors.push({ row, field: field.key, message: `${field.label} is ${shown(value)}; use a whole number from 1.`, section });
      }
      const limit = Object.hasOwn(READINGS_LIMITS, field.key) ? READINGS_LIMITS[field.key] : undefined;
      if (limit && (value > limit.max || (limit.minExclusive ? value <= limit.min : value < limit.min))) {
        errors.push({
          row,
          field: field.key,
          message: `${field.label} is ${shown(value)} in the core's unit, outside ${limit.minExclusive ? 'more than ' : ''}${shown(limit.min)} to ${shown(limit.max)}; check the unit in the header.`,
          section,
        });
      }
    }
    return { row, values, unreadable };
  });
}

/** The test a row belongs to: its Test cell, or '' when the file names none. */
export function testKey(row: ValuesRow): string {
  const id = row.values.testId;
  return typeof id === 'string' ? id : '';
}

export function numberOf(row: ValuesRow, key: string): number | null {
  const v = row.values[key];
  return typeof v === 'number' ? v : null;
}
