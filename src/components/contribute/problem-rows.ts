import { FIELD_BY_KEY, IMPORT_FIELDS, type RowError } from '../../lib/import';
import type { FieldIssue } from '../account/post-json';

/** Columns that identify a row for the person, shown for every row that needs correcting. */
export const IDENTIFYING_FIELDS = ['boreholeId', 'sampleId', 'depthTop', 'depthBottom'] as const;

export interface ProblemRow {
  row: number;
  /** field key → messages */
  cells: Map<string, string[]>;
  /** problems with the whole row (or with fields that cannot be edited here, such as increments) */
  rowMessages: string[];
}

export function isEditableField(field: string | null): field is string {
  return field !== null && FIELD_BY_KEY.has(field);
}

/** Row problems grouped by row, and the fields (in catalogue order) that have a problem somewhere. */
export function groupProblems(errors: readonly RowError[]): { rows: ProblemRow[]; fields: string[] } {
  const byRow = new Map<number, ProblemRow>();
  const fields = new Set<string>();
  for (const error of errors) {
    let entry = byRow.get(error.row);
    if (!entry) {
      entry = { row: error.row, cells: new Map(), rowMessages: [] };
      byRow.set(error.row, entry);
    }
    if (isEditableField(error.field)) {
      entry.cells.set(error.field, [...(entry.cells.get(error.field) ?? []), error.message]);
      fields.add(error.field);
    } else entry.rowMessages.push(error.message);
  }
  const ordered = IMPORT_FIELDS.map((f) => f.key as string).filter(
    (key) => fields.has(key) && !(IDENTIFYING_FIELDS as readonly string[]).includes(key),
  );
  return { rows: [...byRow.values()].sort((a, b) => a.row - b.row), fields: ordered };
}

/** The submit endpoint's issues (`rows.<row>.<field>` or `rows.<row>`) as row problems. */
export function problemsFromIssues(issues: readonly FieldIssue[]): RowError[] {
  const problems: RowError[] = [];
  for (const issue of issues) {
    const match = /^rows\.(\d+)(?:\.(.+))?$/.exec(issue.path);
    if (match) problems.push({ row: Number(match[1]), field: match[2] ?? null, message: issue.message });
  }
  return problems;
}
