/** The closed list of error codes every API response uses, with their HTTP status. */
export const ERROR_STATUS = {
  BAD_REQUEST: 400,
  VALIDATION_FAILED: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  NOT_FOUND: 404,
  METHOD_NOT_ALLOWED: 405,
  CONFLICT: 409,
  PAYLOAD_TOO_LARGE: 413,
  UNSUPPORTED_MEDIA_TYPE: 415,
  UNPROCESSABLE: 422,
  RATE_LIMITED: 429,
  INTERNAL: 500,
  SERVICE_UNAVAILABLE: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

/** One problem with one field of the input; `path` is dotted (`layers.0.cc`), empty for the whole body. */
export interface FieldIssue {
  path: string;
  message: string;
}

export interface ErrorBody {
  error: { code: ErrorCode; message: string; issues?: FieldIssue[] };
}

/** Thrown by services and endpoints; turned into the one error shape by `handleApi`. */
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
