import { ERROR_STATUS, type ErrorCode, type FieldIssue } from '../../contracts/errors';

export { ERROR_STATUS, type ErrorBody, type ErrorCode, type FieldIssue } from '../../contracts/errors';

/**
 * An HTTP answer decided at the edge (guards, body and upload readers, rate limits). Services never
 * throw it: they throw the domain errors of `../errors.ts`, which `error-mapper.ts` turns into codes.
 */
export class ApiError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: FieldIssue[],
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
