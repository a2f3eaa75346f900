import type { TestRecordInput } from '../schemas/test-record-row';

/** One row's values as the checks read them, and where they report problems. */
export interface RowInput {
  /** the value if it is a number, else null */
  num(key: string): number | null;
  /** the value if it is text, else null */
  text(key: string): string | null;
  add(field: string | null, message: string): void;
}

export interface RowIssue {
  field: string | null;
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
