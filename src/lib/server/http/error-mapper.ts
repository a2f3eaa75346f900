import { EngineInputError } from '../../consolidation/errors';
import type { ImportErrorCode } from '../../import';
import {
  BusyError,
  ConflictError,
  type DomainError,
  ImportFileError,
  InvalidInputError,
  InvalidStateError,
  MalformedRequestError,
  NotFoundError,
  RateLimitedError,
  RefusedError,
  TooLargeError,
  UnauthenticatedError,
  UnprocessableError,
} from '../errors';
import { ApiError, ERROR_STATUS, type ErrorCode, type FieldIssue } from './api-error';

/** An error as the API answers it. */
export interface HttpError {
  code: ErrorCode;
  message: string;
  issues?: FieldIssue[];
  headers?: Record<string, string>;
}

type DomainErrorClass = abstract new (...args: never[]) => DomainError;

/** Every domain error class and the code it answers with; the first match wins. */
const DOMAIN_ERROR_CODES: readonly (readonly [DomainErrorClass, ErrorCode])[] = [
  [NotFoundError, 'NOT_FOUND'],
  [ConflictError, 'CONFLICT'],
  [InvalidStateError, 'CONFLICT'],
  [RefusedError, 'FORBIDDEN'],
  [UnauthenticatedError, 'UNAUTHENTICATED'],
  [MalformedRequestError, 'BAD_REQUEST'],
  [InvalidInputError, 'VALIDATION_FAILED'],
  [UnprocessableError, 'UNPROCESSABLE'],
  [TooLargeError, 'PAYLOAD_TOO_LARGE'],
  [RateLimitedError, 'RATE_LIMITED'],
];

/** The import core's file-level codes: a file too large is 413, a mapping that does not fit the file 400, the rest 422. */
export const IMPORT_ERROR_CODES: Readonly<Record<ImportErrorCode, ErrorCode>> = {
  EMPTY_FILE: 'UNPROCESSABLE',
  TOO_LARGE: 'PAYLOAD_TOO_LARGE',
  BINARY_FILE: 'UNPROCESSABLE',
  SPREADSHEET_FILE: 'UNPROCESSABLE',
  UTF16_FILE: 'UNPROCESSABLE',
  NOT_UTF8: 'UNPROCESSABLE',
  DELIMITER_NOT_FOUND: 'UNPROCESSABLE',
  DELIMITER_AMBIGUOUS: 'UNPROCESSABLE',
  DELIMITER_MISMATCH: 'UNPROCESSABLE',
  HEADER_UNCLOSED_QUOTE: 'UNPROCESSABLE',
  HEADER_EMPTY_NAME: 'UNPROCESSABLE',
  HEADER_DUPLICATE_NAME: 'UNPROCESSABLE',
  NO_ROWS: 'UNPROCESSABLE',
  TOO_MANY_ROWS: 'UNPROCESSABLE',
  BAD_MAPPING: 'BAD_REQUEST',
  NOT_AGS4: 'UNPROCESSABLE',
  AGS4_MALFORMED: 'UNPROCESSABLE',
  AGS4_UNKNOWN_UNIT: 'UNPROCESSABLE',
  AGS4_NO_TESTS: 'UNPROCESSABLE',
  READ_FAILED: 'UNPROCESSABLE',
};

/** The HTTP status an import core error code answers with. */
export function importErrorStatus(code: ImportErrorCode): number {
  return ERROR_STATUS[IMPORT_ERROR_CODES[code]];
}

function withIssues(code: ErrorCode, message: string, issues: FieldIssue[] | undefined): HttpError {
  return issues?.length ? { code, message, issues } : { code, message };
}

/**
 * The one place that turns errors into the API's codes: the edge's ApiError, the services' domain
 * errors, the engine's EngineInputError and the import core's file-level errors. Anything else is
 * unexpected (null): the caller logs it and answers 500 without details.
 */
export function toHttpError(error: unknown): HttpError | null {
  if (error instanceof ApiError) {
    return { ...withIssues(error.code, error.message, error.issues), ...(error.headers ? { headers: error.headers } : {}) };
  }
  if (error instanceof ImportFileError) {
    return withIssues(IMPORT_ERROR_CODES[error.importError.code], error.message, error.issues);
  }
  if (error instanceof RateLimitedError) {
    return { code: 'RATE_LIMITED', message: error.message, headers: { 'retry-after': String(error.retryAfterSeconds) } };
  }
  if (error instanceof BusyError) {
    return { code: 'SERVICE_UNAVAILABLE', message: error.message, headers: { 'retry-after': String(error.retryAfterSeconds) } };
  }
  for (const [kind, code] of DOMAIN_ERROR_CODES) {
    if (error instanceof kind) return withIssues(code, error.message, error.issues);
  }
  if (error instanceof EngineInputError) {
    return withIssues('UNPROCESSABLE', `The profile cannot be computed: ${error.message}`, [...error.issues]);
  }
  return null;
}
