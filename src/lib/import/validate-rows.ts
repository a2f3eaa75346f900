import type { RowError } from './errors';
import type { RawRow } from './raw-row';
import { duplicateKey } from './row-key';
import { FIRST_DATA_ROW_NUMBER } from './row-numbers';
import type { TestRecordIncrement, TestRecordRow, TestRecordVocabulary } from './test-record';
import { testRecordRowSchema } from './test-record-row';

/** A row that passed every check: the record in SI units with derived values, and its increments. */
export interface ValidRow {
  row: number;
  record: TestRecordRow;
  increments: TestRecordIncrement[];
}

export interface ValidationContext extends TestRecordVocabulary {
  /** `duplicateKey` of every test the firm already has in the bank (built by the server) */
  existingKeys?: ReadonlySet<string>;
}

export interface ValidationResult {
  valid: ValidRow[];
  errors: RowError[];
}

/**
 * Checks every row against the row schema and the vocabulary, and finds repeated tests: within the file
 * (reported on the later row, naming the earlier) and against the firm's earlier uploads. Problems
 * carried from reading and mapping are reported too, and a field that already has one is not reported
 * again. A row is valid only with no error at all. Never throws, whatever the input.
 */
export function validateRows(rawRows: readonly RawRow[], context: ValidationContext): ValidationResult {
  const valid: ValidRow[] = [];
  const errors: RowError[] = [];
  const schema = testRecordRowSchema({ regions: context.regions ?? [], units: context.units ?? [] });
  const seen = new Map<string, number>();
  const rows: readonly unknown[] = Array.isArray(rawRows) ? rawRows : [];
  for (const [index, candidate] of rows.entries()) {
    const rawRow = (typeof candidate === 'object' && candidate !== null ? candidate : {}) as Partial<RawRow>;
    const row = typeof rawRow.row === 'number' && Number.isInteger(rawRow.row) ? rawRow.row : index + FIRST_DATA_ROW_NUMBER;
    const before = errors.length;
    try {
      const reported = new Set<string | null>();
      for (const problem of Array.isArray(rawRow.problems) ? rawRow.problems : []) {
        const field = typeof problem?.field === 'string' ? problem.field : null;
        reported.add(field);
        errors.push({
          row,
          field,
          message: typeof problem?.message === 'string' ? problem.message : 'This row could not be read.',
        });
      }
      const values = rawRow.values;
      const input =
        typeof values === 'object' && values !== null && !Array.isArray(values)
          ? { ...values, increments: rawRow.increments }
          : values;
      const parsed = schema.safeParse(input);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) {
          const field =
            typeof issue.path[0] === 'string' ? issue.path[0] : issue.path.length === 0 ? null : String(issue.path[0]);
          if (field !== null && reported.has(field)) continue;
          errors.push({ row, field, message: issue.message });
        }
      }
      const key = keyOf(values);
      if (key !== null) {
        const earlier = seen.get(key);
        if (context.existingKeys?.has(key)) {
          errors.push({
            row,
            field: null,
            message:
              'This test is already in the bank from an earlier upload (same borehole, sample and depths). Remove the row, or correct its ids or depths if it is a different test.',
          });
        } else if (earlier !== undefined) {
          errors.push({
            row,
            field: null,
            message: `Same borehole, sample and depths as row ${earlier}; remove one of the two rows, or correct the ids or depths.`,
          });
        } else seen.set(key, row);
      }
      if (parsed.success && errors.length === before)
        valid.push({ row, record: parsed.data.record, increments: parsed.data.increments });
    } catch {
      errors.length = before;
      errors.push({ row, field: null, message: 'This row could not be checked; check its values.' });
    }
  }
  return { valid, errors };
}

function keyOf(values: unknown): string | null {
  if (typeof values !== 'object' || values === null) return null;
  const v = values as Record<string, unknown>;
  const id = typeof v.boreholeId === 'string' || typeof v.boreholeId === 'number' ? String(v.boreholeId).trim() : '';
  const sample = typeof v.sampleId === 'string' || typeof v.sampleId === 'number' ? String(v.sampleId) : '';
  const top = Number(v.depthTop);
  const bottom = Number(v.depthBottom);
  if (id === '' || v.depthTop === null || v.depthBottom === null || v.depthTop === '' || v.depthBottom === '') return null;
  if (!Number.isFinite(top) || !Number.isFinite(bottom)) return null;
  return duplicateKey({ boreholeId: id, sampleId: sample, depthTop: top, depthBottom: bottom });
}
