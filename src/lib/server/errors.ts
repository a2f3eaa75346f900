import type { FieldIssue } from '../contracts/errors';
import type { ImportError } from '../import';

/**
 * What services throw when a request cannot be carried out. Each class names what went wrong in the
 * domain's terms; `http/error-mapper.ts` alone decides which HTTP code each one answers with. The
 * message is for people: what happened, why, and what to do.
 */
export abstract class DomainError extends Error {
  constructor(
    message: string,
    readonly issues?: FieldIssue[],
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The thing does not exist, or the caller may not know that it does. */
export class NotFoundError extends DomainError {}

/** The request clashes with what is stored: a name already taken, the same file again. */
export class ConflictError extends DomainError {}

/** The object is in a state that does not allow this step (a submission already decided). */
export class InvalidStateError extends DomainError {}

/** A rule of the product forbids this, even though the person's role allows the action. */
export class RefusedError extends DomainError {}

/** The caller is not who they need to be: no key, a revoked key, no session. */
export class UnauthenticatedError extends DomainError {}

/** The request cannot be read at all as what it claims to be (an operation the library refused as malformed). */
export class MalformedRequestError extends DomainError {}

/** One or more fields of the input are missing, malformed or name something that does not exist (issues say where). */
export class InvalidInputError extends DomainError {}

/** The input is well formed but cannot be accepted as it is (issues say where). */
export class UnprocessableError extends DomainError {}

/** The input is larger than the product takes. */
export class TooLargeError extends DomainError {}

/** Too many requests in a short time; the caller may retry after `retryAfterSeconds`. */
export class RateLimitedError extends DomainError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message);
  }
}

/** Every worker for this kind of work is busy and its queue is full; retry after `retryAfterSeconds`. */
export class BusyError extends DomainError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message);
  }
}

/** A file the import core could not read as a table; carries the core's own error and code. */
export class ImportFileError extends DomainError {
  constructor(readonly importError: ImportError) {
    super(
      importError.message,
      importError.issues?.map((issue) => ({ path: `line.${issue.line}`, message: issue.message })),
    );
  }
}
