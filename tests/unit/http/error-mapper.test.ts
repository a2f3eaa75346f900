// One mapper turns every named error into the API's closed list of codes.
// source: RFC 9110 §15.5 (400, 401, 403, 404, 409, 413, 422 semantics) and §10.2.3 (Retry-After);
// RFC 9457 (problem details: a stable machine-readable code beside a human message).
import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../src/lib/consolidation/errors';
import { IMPORT_ERROR_CODES as IMPORT_CORE_CODES } from '../../../src/lib/import/errors';
import {
  ConflictError,
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
} from '../../../src/lib/server/errors';
import { ApiError, ERROR_STATUS } from '../../../src/lib/server/http/api-error';
import { IMPORT_ERROR_CODES, importErrorStatus, toHttpError } from '../../../src/lib/server/http/error-mapper';

describe('domain errors', () => {
  it.each([
    [new NotFoundError('No such submission.'), 'NOT_FOUND', 404],
    [new ConflictError('Already uploaded.'), 'CONFLICT', 409],
    [new InvalidStateError('Already decided.'), 'CONFLICT', 409],
    [new RefusedError('The owner cannot be removed.'), 'FORBIDDEN', 403],
    [new UnauthenticatedError('Send your key.'), 'UNAUTHENTICATED', 401],
    [new MalformedRequestError('Not readable.'), 'BAD_REQUEST', 400],
    [new InvalidInputError('Fix the fields.', [{ path: 'name', message: 'Too short.' }]), 'VALIDATION_FAILED', 400],
    [
      new UnprocessableError('Rows need correcting.', [{ path: 'rows.2.cc', message: 'Cc must be positive.' }]),
      'UNPROCESSABLE',
      422,
    ],
    [new TooLargeError('Split the file.'), 'PAYLOAD_TOO_LARGE', 413],
  ])('%s answers %s (%i) with its message and issues', (error, code, status) => {
    const mapped = toHttpError(error);
    expect(mapped).toEqual({ code, message: error.message, ...(error.issues ? { issues: error.issues } : {}) });
    expect(ERROR_STATUS[mapped?.code ?? 'INTERNAL']).toBe(status);
  });

  it('a rate limit carries Retry-After in seconds', () => {
    expect(toHttpError(new RateLimitedError('Slow down.', 60))).toEqual({
      code: 'RATE_LIMITED',
      message: 'Slow down.',
      headers: { 'retry-after': '60' },
    });
  });

  it("the edge's ApiError keeps its own code, issues and headers", () => {
    const error = new ApiError('UNSUPPORTED_MEDIA_TYPE', 'Send JSON.', undefined, { vary: 'content-type' });
    expect(toHttpError(error)).toEqual({
      code: 'UNSUPPORTED_MEDIA_TYPE',
      message: 'Send JSON.',
      headers: { vary: 'content-type' },
    });
  });

  it('anything else is unexpected: no code, so the caller answers 500 without details', () => {
    expect(toHttpError(new Error('relation "x" does not exist'))).toBeNull();
    expect(toHttpError('a string')).toBeNull();
  });
});

describe("the engine's and the import core's errors", () => {
  it('a physically impossible profile is 422 with the field it names', () => {
    const mapped = toHttpError(new EngineInputError('layers.1.unitWeightBelowWater', 'is below the unit weight of water'));
    expect(mapped).toEqual({
      code: 'UNPROCESSABLE',
      message: 'The profile cannot be computed: is below the unit weight of water',
      issues: [{ path: 'layers.1.unitWeightBelowWater', message: 'is below the unit weight of water' }],
    });
  });

  it('has a code for every import core error code, and no other', () => {
    expect(Object.keys(IMPORT_ERROR_CODES).sort()).toEqual([...IMPORT_CORE_CODES].sort());
  });

  it.each([
    ['TOO_LARGE', 413],
    ['BAD_MAPPING', 400],
    ['EMPTY_FILE', 422],
    ['AGS4_MALFORMED', 422],
  ] as const)('%s answers %i', (code, status) => {
    expect(importErrorStatus(code)).toBe(status);
  });

  it('a file-level import error keeps its message and names the lines at fault', () => {
    const error = new ImportFileError({
      code: 'AGS4_MALFORMED',
      message: 'Two lines are broken.',
      issues: [{ line: 7, message: 'no HEADING' }],
    });
    expect(toHttpError(error)).toEqual({
      code: 'UNPROCESSABLE',
      message: 'Two lines are broken.',
      issues: [{ path: 'line.7', message: 'no HEADING' }],
    });
  });
});
