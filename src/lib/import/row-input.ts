import type { ImportFieldKey, NumberFieldKey, TextFieldKey } from './fields';
import type { TestRecordInput } from './test-record';

/** Where a row problem sits: a field, the increments, or (null) the whole row. */
export type RowIssueField = ImportFieldKey | 'increments';

/** One row's values as the checks read them, and where they report problems. */
export interface RowInput {
  /** the value if it is a number, else null */
  num(key: NumberFieldKey): number | null;
  /** the value if it is text, else null */
  text(key: TextFieldKey): string | null;
  add(field: RowIssueField | null, message: string): void;
}

export interface RowIssue {
  field: RowIssueField | null;
  message: string;
}

export function rowInput(input: TestRecordInput, issues: RowIssue[]): RowInput {
  return {
    num: (key) => {
      const v = input[key];
      return typeof v === 'number' ? v : null;
    },
    text: (key) => {
      const v = input[key];
      return typeof v === 'string' ? v : null;
    },
    add: (field, message) => {
      issues.push({ field, message });
    },
  };
}
