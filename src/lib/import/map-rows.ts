import type { CsvTable } from './csv-table';
import { columnName } from './csv-table';
import { failure, type ImportResult, type RowError } from './errors';
import { FIELD_BY_KEY, type ImportField, type ImportFieldKey } from './fields';
import { parseNumberCell } from './parse-number';
import type { RawRow, RawValue } from './raw-row';
import { toSi, unitChoice } from './units';

/**
 * Cell corrections made in the browser table, by row number (as in errors) and field key, written as the
 * person typed them, in the column's unit. They override the file's cells.
 */
export type RowEdits = Readonly<Record<number | string, Readonly<Record<string, string>>>>;

export interface MapRowsOptions {
  /** a value for every row whose cell is blank or whose field has no column (e.g. the region for the whole file) */
  defaults?: Readonly<Record<string, string>>;
}

interface Source {
  field: ImportField;
  column: number | null;
  unit: string | null;
}

/**
 * Turns the table's text cells into raw rows keyed by field, numbers converted to the bank's SI units.
 * `mapping[i]` is the field for column i (null: not imported); `units[field]` the unit id the column is
 * written in (absent: the SI unit). Numbers are read tolerantly (see parse-number.ts; a decimal comma
 * only in semicolon- or tab-separated files); a cell that is not a number is left out of the row and
 * recorded as a problem, as are the table's own row errors, so `validateRows` reports them all. A
 * mapping that names an unknown field or unit, or one field twice, gives BAD_MAPPING.
 */
export function mapRows(
  table: CsvTable,
  mapping: readonly (string | null)[],
  units: Readonly<Partial<Record<string, string>>> = {},
  edits: RowEdits = {},
  options: MapRowsOptions = {},
): ImportResult<{ rows: RawRow[] }> {
  const sources = new Map<ImportFieldKey, Source>();
  if (mapping.length !== table.headers.length) {
    return failure(
      'BAD_MAPPING',
      `The column choices cover ${mapping.length} columns but the file has ${table.headers.length}. Choose a field (or "not imported") for each column.`,
    );
  }
  for (const [column, key] of mapping.entries()) {
    if (key === null) continue;
    const field = FIELD_BY_KEY.get(key);
    if (!field)
      return failure(
        'BAD_MAPPING',
        `${capitalise(columnName(column))} is mapped to "${key}", which is not a field Claybank imports.`,
      );
    if (sources.has(field.key)) {
      return failure('BAD_MAPPING', `${field.label} is chosen for two columns; choose it for one column only.`);
    }
    sources.set(field.key, { field, column, unit: null });
  }
  for (const key of [...Object.keys(units), ...Object.keys(options.defaults ?? {})]) {
    if (!FIELD_BY_KEY.has(key)) return failure('BAD_MAPPING', `"${key}" is not a field Claybank imports.`);
  }
  for (const [key, unitId] of Object.entries(units)) {
    if (unitId === undefined) continue;
    const field = FIELD_BY_KEY.get(key) as ImportField;
    if (field.unitKind === 'none' || !unitChoice(field.unitKind, unitId)) {
      return failure('BAD_MAPPING', `"${unitId}" is not a unit Claybank converts for ${field.label}.`);
    }
  }
  for (const key of [...Object.keys(options.defaults ?? {}), ...editedFields(edits)]) {
    const field = FIELD_BY_KEY.get(key);
    if (!field) return failure('BAD_MAPPING', `An edit names "${key}", which is not a field Claybank imports.`);
    if (!sources.has(field.key)) sources.set(field.key, { field, column: null, unit: null });
  }
  for (const [key, source] of sources) source.unit = units[key] ?? null;

  const decimalComma = table.delimiter !== ',';
  const problemsByRow = new Map<number, RowError[]>();
  for (const error of table.rowErrors) problemsByRow.set(error.row, [...(problemsByRow.get(error.row) ?? []), error]);
  const defaults = options.defaults ?? {};
  const rows: RawRow[] = [];
  for (const { row, cells } of table.rows) {
    const edit = Object.hasOwn(edits, String(row)) ? edits[String(row)] : undefined;
    const values: Partial<Record<ImportFieldKey, RawValue>> = {};
    const problems: RowError[] = problemsByRow.get(row)?.slice() ?? [];
    for (const [key, source] of sources) {
      let text = edit && Object.hasOwn(edit, key) ? edit[key] : source.column === null ? undefined : cells[source.column];
      if ((text === undefined || text.trim() === '') && Object.hasOwn(defaults, key)) text = defaults[key];
      if (text === undefined) continue;
      if (source.field.type === 'text') {
        const trimmed = String(text).trim();
        values[key] = trimmed === '' ? null : trimmed;
        continue;
      }
      const parsed = parseNumberCell(String(text), { decimalComma, percent: key.endsWith('Pct') });
      if (!parsed.ok) problems.push({ row, field: key, message: `${source.field.label}: ${parsed.message}` });
      else values[key] = parsed.value === null ? null : toSi(parsed.value, source.field.unitKind, source.unit);
    }
    rows.push(problems.length > 0 ? { row, values, problems } : { row, values });
  }
  return { ok: true, rows };
}

function editedFields(edits: RowEdits): string[] {
  const keys = new Set<string>();
  for (const edit of Object.values(edits)) for (const key of Object.keys(edit ?? {})) keys.add(key);
  return [...keys];
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
