import { APIError } from 'better-auth/api';
import { ApiError, type ErrorCode } from '../http/api-error';

const STATUS_TO_CODE: Record<number, ErrorCode> = {
  400: 'BAD_REQUEST',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  409: 'CONFLICT',
  422: 'UNPROCESSABLE',
  429: 'RATE_LIMITED',
};

/** Re-throws a better-auth error in our error shape; `messages` gives plain wording per better-auth code. */
export function rethrowAuthError(error: unknown, messages: Record<string, string> = {}, fallback?: string): never {
  if (error instanceof APIError) {
    const authCode = typeof error.body?.code === 'string' ? error.body.code : '';
    const code = STATUS_TO_CODE[error.statusCode] ?? 'BAD_REQUEST';
    throw new ApiError(code, messages[authCode] ?? fallback ?? error.body?.message ?? 'The request was refused.');
  }
  throw error;
}

/** The better-auth error code of an error, if it is one. */
export function authErrorCode(error: unknown): string | null {
  return error instanceof APIError && typeof error.body?.code === 'string' ? error.body.code : null;
}
