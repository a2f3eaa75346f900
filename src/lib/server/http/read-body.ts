import { ApiError } from './api-error';
import { jsonNestingDepth, MAX_JSON_DEPTH, unstorableTextIssues, unstorableTextReason } from './json-safety';

const KIB = 1024;
const MIB = 1024 * KIB;

/**
 * The most a JSON body may weigh, per kind of route. Forms are small; a record correction carries a
 * few dozen fields; an estimate up to 30 layers with distributions and a result summary; a decision
 * up to 10,000 record comments; a partner script's rows are about as large as the 20 MB file limit.
 */
export const BODY_LIMIT_BYTES = {
  form: 32 * KIB,
  recordCorrection: 64 * KIB,
  estimate: 512 * KIB,
  reviewDecision: 4 * MIB,
  partnerRows: 24 * MIB,
} as const;

/**
 * A body that passes its limit while being read is read on and dropped up to this size, so the client
 * gets the 413 on a healthy connection instead of a reset while it is still sending. Past it the
 * connection is closed.
 */
const DRAIN_LIMIT_BYTES = 64 * MIB;

function sizeText(bytes: number): string {
  return bytes >= MIB ? `${(bytes / MIB).toFixed(1)} MB` : `${Math.ceil(bytes / KIB)} kB`;
}

function tooLarge(limitBytes: number, seenBytes: number, whole: boolean, closeConnection = false): ApiError {
  const size = whole ? `The body is ${sizeText(seenBytes)}` : `The body is larger than ${sizeText(limitBytes)}`;
  return new ApiError(
    'PAYLOAD_TOO_LARGE',
    `${size}; this endpoint takes at most ${sizeText(limitBytes)}. Send less in one request.`,
    undefined,
    closeConnection ? { connection: 'close' } : undefined,
  );
}

/** Reads and drops the rest of a body; false when more than `budgetBytes` remain (the reader is then cancelled). */
async function drain(reader: ReadableStreamDefaultReader<Uint8Array>, budgetBytes: number): Promise<boolean> {
  let left = budgetBytes;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) return true;
    left -= value.byteLength;
    if (left < 0) {
      await reader.cancel().catch(() => undefined);
      return false;
    }
  }
}

/**
 * Reads a request body up to `limitBytes`: refused with 413 when Content-Length announces more (the
 * body is then left unread, and Node drops it after the answer), and when the stream itself grows past
 * the limit (a missing or false Content-Length does not get round it).
 */
export async function readBodyBytes(request: Request, limitBytes: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get('content-length') ?? Number.NaN);
  if (Number.isFinite(declared) && declared > limitBytes) throw tooLarge(limitBytes, declared, true);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      const drained = await drain(reader, DRAIN_LIMIT_BYTES - total);
      throw tooLarge(limitBytes, total, false, !drained);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/**
 * Parses JSON text and refuses, in the one error shape, what no endpoint should have to handle:
 * nesting deeper than MAX_JSON_DEPTH, broken JSON, and text that cannot be stored (NUL characters,
 * unpaired surrogates, a `__proto__` key), each named by its field path.
 */
export function parseJsonText(text: string): unknown {
  if (jsonNestingDepth(text, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) {
    throw new ApiError(
      'BAD_REQUEST',
      `The JSON is nested more than ${MAX_JSON_DEPTH} levels deep; no request needs that. Flatten the body.`,
    );
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new ApiError('BAD_REQUEST', 'The request body is not valid JSON. Check for a missing comma, quote or bracket.');
  }
  const issues = unstorableTextIssues(value);
  if (issues.length > 0) {
    throw new ApiError('VALIDATION_FAILED', 'Some text in the body cannot be stored; see issues for each field.', issues);
  }
  return value;
}

/** parseJsonText on bytes that must be valid UTF-8. */
export function parseJsonBytes(bytes: Uint8Array): unknown {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new ApiError('BAD_REQUEST', 'The body is not valid UTF-8 text. Send JSON encoded as UTF-8.');
  }
  return parseJsonText(text);
}

function requireJsonType(request: Request): void {
  const type = request.headers.get('content-type') ?? '';
  if (!type.toLowerCase().includes('application/json')) {
    throw new ApiError('UNSUPPORTED_MEDIA_TYPE', 'Send the body as JSON with the header Content-Type: application/json.');
  }
}

/** A JSON request body, read within `limitBytes` and checked as parseJsonBytes does. */
export async function readJsonValue(request: Request, limitBytes: number = BODY_LIMIT_BYTES.form): Promise<unknown> {
  requireJsonType(request);
  return parseJsonBytes(await readBodyBytes(request, limitBytes));
}

/**
 * For endpoints that take no input: no body, or an empty JSON object `{}` (what the islands send with
 * a POST), is accepted. Anything else is refused as a JSON body would be, and a field in it with 400
 * naming the field, so nothing sent is silently ignored.
 */
export async function readEmptyBody(request: Request): Promise<void> {
  const bytes = await readBodyBytes(request, BODY_LIMIT_BYTES.form);
  if (bytes.every((byte) => byte === 0x20 || byte === 0x09 || byte === 0x0a || byte === 0x0d)) return;
  requireJsonType(request);
  const value = parseJsonBytes(bytes);
  const isObject = typeof value === 'object' && value !== null && !Array.isArray(value);
  const keys = isObject ? Object.keys(value) : [];
  if (isObject && keys.length === 0) return;
  throw new ApiError(
    'VALIDATION_FAILED',
    'This endpoint takes no fields. Send no body, or an empty JSON object {}.',
    isObject
      ? keys.map((key) => ({ path: key, message: `"${key}" is not taken here. Remove it.` }))
      : [{ path: '', message: 'Send no body, or an empty JSON object {}.' }],
  );
}

/** Text from outside a JSON body (a query parameter, a file name), refused with 400 when it cannot be stored. */
export function requireStorableText<T extends string | null | undefined>(value: T, path: string): T {
  const reason = typeof value === 'string' ? unstorableTextReason(value) : null;
  if (reason)
    throw new ApiError('VALIDATION_FAILED', `${path} cannot be stored; see issues.`, [{ path, message: `The text ${reason}` }]);
  return value;
}
