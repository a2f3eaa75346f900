/** One input field that makes the estimate impossible; `path` is the request body's dotted path. */
export interface InputIssue {
  path: string;
  message: string;
}

/**
 * Raised when an input that passed schema validation is still physically impossible for the
 * engine (a saturated unit weight below water's, Cr not below Cc, drains wider than their
 * spacing…). Each issue names the request field with the body's dotted path, e.g.
 * `layers.1.unitWeightBelowWater`, so the API and the form can point at it.
 */
export class EngineInputError extends Error {
  override readonly name = 'EngineInputError';
  readonly issues: readonly InputIssue[];

  constructor(fieldPath: string, message: string, more: readonly InputIssue[] = []) {
    super(more.length ? `${message} (and ${more.length} more: see issues)` : message);
    this.issues = [{ path: fieldPath, message }, ...more];
  }

  /** The error for a non-empty list of issues. */
  static of(issues: readonly InputIssue[]): EngineInputError {
    const [first, ...more] = issues;
    if (!first) throw new Error('EngineInputError.of needs at least one issue.');
    return new EngineInputError(first.path, first.message, more);
  }

  /** Path of the first issue. */
  get fieldPath(): string {
    return this.issues[0]?.path ?? '';
  }
}
