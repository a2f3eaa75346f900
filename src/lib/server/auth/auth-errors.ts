import { APIError } from 'better-auth/api';
import {
  ConflictError,
  type DomainError,
  MalformedRequestError,
  NotFoundError,
  RateLimitedError,
  RefusedError,
  UnauthenticatedError,
  UnprocessableError,
} from '../errors';

const malformed = (message: string) => new MalformedRequestError(message);

const STATUS_TO_ERROR: Record<number, (message: string) => DomainError> = {
  400: malformed,
  401: (message) => new UnauthenticatedError(message),
  403: (message) => new RefusedError(message),
  404: (message) => new NotFoundError(message),
  409: (message) => new ConflictError(message),
  422: (message) => new UnprocessableError(message),
  429: (message) => new RateLimitedError(message, 60),
};

/** Re-throws a better-auth error as our domain error; `messages` gives plain wording per better-auth code. */
export function rethrowAuthError(error: unknown, messages: Record<string, string> = {}, fallback?: string): never {
  if (error instanceof APIError) {
    const authCode = typeof error.body?.code === 'string' ? error.body.code : '';
    const message = messages[authCode] ?? fallback ?? error.body?.message ?? 'The request was refused.';
    throw (STATUS_TO_ERROR[error.statusCode] ?? malformed)(message);
  }
  throw error;
}

/** The better-auth error code of an error, if it is one. */
export function authErrorCode(error: unknown): string | null {
  return error instanceof APIError && typeof error.body?.code === 'string' ? error.body.code : null;
}
