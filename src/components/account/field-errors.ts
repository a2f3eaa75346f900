import type { FieldIssue } from './post-json';

/** Messages keyed by the form field they belong to; the first message per field wins. */
export type FieldErrors = Partial<Record<string, string>>;

/** zod issues (browser-side validation) by their top-level field. */
export function fieldErrorsFromZod(issues: readonly { path: readonly PropertyKey[]; message: string }[]): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of issues) {
    const field = String(issue.path[0] ?? '');
    errors[field] ??= issue.message;
  }
  return errors;
}

/** The server's per-field issues (dotted paths) by their top-level field. */
export function fieldErrorsFromServer(issues: readonly FieldIssue[]): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of issues) {
    const field = issue.path.split('.')[0] ?? '';
    errors[field] ??= issue.message;
  }
  return errors;
}
