// Reading requests: the body (with a size cap), JSON and NDJSON payloads, and the bearer key.
import { timingSafeEqual } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import { SearchFakeError } from '../errors';

export const MAX_PAYLOAD_BYTES = 100 * 1024 * 1024;

export async function readBody(req: IncomingMessage): Promise<Buffer> {
  const declared = Number(req.headers['content-length'] ?? 0);
  if (declared > MAX_PAYLOAD_BYTES) throw payloadTooLarge();
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_PAYLOAD_BYTES) throw payloadTooLarge();
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

function payloadTooLarge(): SearchFakeError {
  return new SearchFakeError(
    'payload_too_large',
    `The provided payload reached the size limit. The maximum accepted payload size is ${MAX_PAYLOAD_BYTES / 1024 / 1024} MiB.`,
  );
}

/** A JSON body; `required` bodies answer missing_payload when empty. */
export function parseJson(body: Buffer, required: boolean): unknown {
  const text = body.toString('utf8');
  if (text.trim() === '') {
    if (required) throw new SearchFakeError('missing_payload', 'A json payload is missing.');
    return undefined;
  }
  try {
    return JSON.parse(text);
  } catch (error) {
    throw new SearchFakeError('malformed_payload', `The json payload provided is malformed. \`${(error as Error).message}\`.`);
  }
}

const DOCUMENT_TYPES = ['application/json', 'application/x-ndjson'];

/** The documents of an add/update request (JSON array or object, or NDJSON). */
export function parseDocuments(req: IncomingMessage, body: Buffer): Array<Record<string, unknown>> {
  const type = (req.headers['content-type'] ?? '').split(';')[0]?.trim().toLowerCase() ?? '';
  const accepted = `${DOCUMENT_TYPES.map((t) => `\`${t}\``).join(', ')}`;
  if (!type) {
    throw new SearchFakeError(
      'missing_content_type',
      `A Content-Type header is missing. Accepted values for the Content-Type header are: ${accepted}`,
    );
  }
  if (!DOCUMENT_TYPES.includes(type)) {
    throw new SearchFakeError(
      'invalid_content_type',
      `The Content-Type \`${type}\` is invalid. Accepted values for the Content-Type header are: ${accepted}`,
    );
  }
  const text = body.toString('utf8');
  if (text.trim() === '')
    throw new SearchFakeError('missing_payload', `A ${type === 'application/json' ? 'json' : 'ndjson'} payload is missing.`);
  let parsed: unknown;
  try {
    parsed =
      type === 'application/json'
        ? JSON.parse(text)
        : text
            .split('\n')
            .filter((l) => l.trim())
            .map((l) => JSON.parse(l));
  } catch (error) {
    throw new SearchFakeError(
      'malformed_payload',
      `The \`${type === 'application/json' ? 'json' : 'ndjson'}\` payload provided is malformed. \`${(error as Error).message}\`.`,
    );
  }
  const list = Array.isArray(parsed) ? parsed : [parsed];
  for (const doc of list) {
    if (doc === null || typeof doc !== 'object' || Array.isArray(doc)) {
      throw new SearchFakeError(
        'malformed_payload',
        `The \`json\` payload provided is malformed. \`Couldn't serialize document value: expected an object, found ${JSON.stringify(doc)}\`.`,
      );
    }
  }
  return list as Array<Record<string, unknown>>;
}

/** Refuses requests without the configured key (401 when missing, 403 when wrong). */
export function checkKey(req: IncomingMessage, key: string | null): void {
  if (!key) return;
  const header = req.headers.authorization;
  if (!header) {
    throw new SearchFakeError(
      'missing_authorization_header',
      'The Authorization header is missing. It must use the bearer authorization method.',
    );
  }
  const given = Buffer.from(header.startsWith('Bearer ') ? header.slice(7) : '');
  const expected = Buffer.from(key);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) {
    throw new SearchFakeError('invalid_api_key', 'The provided API key is invalid.');
  }
}
