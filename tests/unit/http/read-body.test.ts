// The one JSON body reader: size limits read from the stream, nesting, text PostgreSQL cannot store.
// source: OWASP ASVS 5.0 §5.2.1 (accept only sizes the app can process), §15.3.6 (no prototype
// pollution); RFC 9110 §15.5.14 (413 Content Too Large); The Unicode Standard 15.0 §3.9 D91
// (an unpaired surrogate is ill-formed UTF-16); PostgreSQL 15 docs §8.3 (text cannot hold NUL) and
// §8.14 (jsonb refuses \u0000 and unpaired surrogate escapes).
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ApiError } from '../../../src/lib/server/http/api-error';
import { jsonNestingDepth, MAX_JSON_DEPTH, unstorableTextIssues } from '../../../src/lib/server/http/json-safety';
import { BODY_LIMIT_BYTES, readBodyBytes, readJsonValue, requireStorableText } from '../../../src/lib/server/http/read-body';
import { readJsonBody } from '../../../src/lib/server/http/respond';

const post = (body: BodyInit, headers: Record<string, string> = { 'content-type': 'application/json' }) =>
  new Request('http://127.0.0.1/api/x', { method: 'POST', body, headers, duplex: 'half' } as RequestInit);

/** A body sent in pieces with no Content-Length, as a chunked upload arrives. */
function streamed(pieces: number, pieceBytes: number): ReadableStream<Uint8Array> {
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent++ === pieces) controller.close();
      else controller.enqueue(new Uint8Array(pieceBytes).fill(0x20));
    },
  });
}

const failure = async (promise: Promise<unknown>) => {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(ApiError);
  return error as ApiError;
};

describe('body size', () => {
  it('refuses a body whose Content-Length is over the limit, without reading it', async () => {
    const request = post('x'.repeat(10), { 'content-type': 'application/json', 'content-length': String(5 * 1024 * 1024) });
    const error = await failure(readBodyBytes(request, 1024));
    expect(error.code).toBe('PAYLOAD_TOO_LARGE');
    expect(error.status).toBe(413);
    expect(request.bodyUsed).toBe(false);
  });

  it('refuses a streamed body once it passes the limit, whatever Content-Length says or does not', async () => {
    const error = await failure(readBodyBytes(post(streamed(100, 1024)), 10 * 1024));
    expect(error.code).toBe('PAYLOAD_TOO_LARGE');
  });

  it('reads a body at exactly the limit', async () => {
    const bytes = await readBodyBytes(post(streamed(10, 1024)), 10 * 1024);
    expect(bytes.byteLength).toBe(10 * 1024);
  });

  it('uses the small form limit unless the route names a larger one', async () => {
    const body = JSON.stringify({ text: 'a'.repeat(BODY_LIMIT_BYTES.form) });
    expect((await failure(readJsonBody(post(body), z.object({ text: z.string() })))).code).toBe('PAYLOAD_TOO_LARGE');
    await expect(readJsonBody(post(body), z.object({ text: z.string() }), BODY_LIMIT_BYTES.estimate)).resolves.toBeTruthy();
  });
});

describe('nesting', () => {
  it('counts brackets outside strings only', () => {
    expect(jsonNestingDepth('{"a":[1,{"b":"[[[{{{"}]}')).toBe(3);
    expect(jsonNestingDepth('"\\"[["')).toBe(0);
    expect(jsonNestingDepth('[]')).toBe(1);
  });

  it('refuses 20,000 levels with a 400 before parsing, and accepts the limit itself', async () => {
    const deep = `${'['.repeat(20_000)}${']'.repeat(20_000)}`;
    const error = await failure(readJsonValue(post(deep), BODY_LIMIT_BYTES.estimate));
    expect(error.code).toBe('BAD_REQUEST');
    expect(error.message).toContain(String(MAX_JSON_DEPTH));
    const atLimit = `${'['.repeat(MAX_JSON_DEPTH)}${']'.repeat(MAX_JSON_DEPTH)}`;
    await expect(readJsonValue(post(atLimit))).resolves.toBeTruthy();
  });
});

describe('text that cannot be stored', () => {
  it('names the field holding a NUL character or an unpaired surrogate', () => {
    const value = JSON.parse('{"name":"Quay\\u0000side","layers":[{"name":"clay \\ud800"}],"ok":"σ′p 72 kPa 😀"}');
    expect(unstorableTextIssues(value).map((i) => i.path)).toEqual(['name', 'layers.0.name']);
  });

  it('finds a low surrogate without its high half, and leaves a proper pair alone', () => {
    expect(unstorableTextIssues('\udc00')).toHaveLength(1);
    expect(unstorableTextIssues('\ud83d\ude00')).toEqual([]);
  });

  it('checks keys too, and refuses a __proto__ key wherever it sits', () => {
    const value = JSON.parse('{"values":{"__proto__":{"role":"owner"},"bad\\u0000key":1}}');
    expect(unstorableTextIssues(value).map((i) => i.path)).toEqual(['values.__proto__', 'values.bad\u0000key']);
  });

  it('turns them into one 400 with per-field issues', async () => {
    const error = await failure(readJsonValue(post('{"name":"\\ud800"}')));
    expect(error.code).toBe('VALIDATION_FAILED');
    expect(error.issues?.[0]?.path).toBe('name');
  });

  it('refuses bytes that are not UTF-8', async () => {
    const error = await failure(
      readJsonValue(post(new Uint8Array([0x7b, 0x22, 0x61, 0x22, 0x3a, 0x22, 0xed, 0xa0, 0x80, 0x22, 0x7d]))),
    );
    expect(error.code).toBe('BAD_REQUEST');
  });

  it('refuses a query parameter or file name the same way', () => {
    expect(() => requireStorableText('a\u0000b', 'fileName')).toThrow(ApiError);
    expect(requireStorableText('results.csv', 'fileName')).toBe('results.csv');
    expect(requireStorableText(null, 'fileName')).toBeNull();
  });
});
