/**
 * Raised when an input that passed schema validation is still physically impossible for the
 * engine (for example a settlement point whose stresses cannot be computed). `fieldPath` uses the
 * request body's dotted path, e.g. `layers.1.cv`, so the API can point at the field.
 */
export class EngineInputError extends Error {
  override readonly name = 'EngineInputError';
  readonly fieldPath: string;

  constructor(fieldPath: string, message: string) {
    super(message);
    this.fieldPath = fieldPath;
  }
}
