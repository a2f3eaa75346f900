/**
 * The one error body every API response uses, and its closed list of codes with their HTTP status.
 * Shared by the server (which answers with it) and the islands (which read it).
 */
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
