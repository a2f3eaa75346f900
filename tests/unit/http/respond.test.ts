import type { APIContext } from 'astro';
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ApiError } from '../../../src/lib/server/http/api-error';
import { errorResponse, handleApi, readJsonBody } from '../../../src/lib/server/http/respond';

const context = {
  locals: {},
  request: new Request('http://127.0.0.1/api/x', { method: 'POST' }),
  url: new URL('http://127.0.0.1/api/x'),
} as unknown as APIContext;

describe('the one error shape', () => {
  it('carries code, message and issues, with the status of the code', async () => {
    const response = errorResponse('VALIDATION_FAILED', 'Fix the fields.', [
      { path: 'layers.0.cc', message: 'Cc must be positive.' },
    ]);
    expect(response.status).toBe(400);
    expect(response.headers.get('content-type')).toContain('application/json');
    expect(await response.json()).toEqual({
      error: {
        code: 'VALIDATION_FAILED',
        message: 'Fix the fields.',
        issues: [{ path: 'layers.0.cc', message: 'Cc must be positive.' }],
      },
    });
  });

  it('leaves issues out when there are none', async () => {
    expect(await errorResponse('NOT_FOUND', 'Nothing here.').json()).toEqual({
      error: { code: 'NOT_FOUND', message: 'Nothing here.' },
    });
  });

  it('maps a thrown ApiError to its status and body', async () => {
    const route = handleApi(() => {
      throw new ApiError('FORBIDDEN', 'Your role may not do this.');
    });
    const response = await route(context);
    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: { code: 'FORBIDDEN', message: 'Your role may not do this.' } });
  });

  it('turns an unexpected error into a 500 that names no internals', async () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const route = handleApi(() => {
      throw new Error('relation "secret_table" does not exist at /srv/app/db.ts:12');
    });
    const response = await route(context);
    const text = await response.text();
    expect(response.status).toBe(500);
    expect(JSON.parse(text).error.code).toBe('INTERNAL');
    expect(text).not.toContain('secret_table');
    expect(text).not.toContain('/srv/app');
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });
});

describe('readJsonBody', () => {
  const schema = z.object({ cc: z.number({ error: 'Cc must be a number.' }).positive('Cc must be positive.') }).strict();
  const post = (body: string, type = 'application/json') =>
    new Request('http://127.0.0.1/api/x', { method: 'POST', body, headers: { 'content-type': type } });

  it('returns the parsed body when it fits', async () => {
    await expect(readJsonBody(post('{"cc":0.4}'), schema)).resolves.toEqual({ cc: 0.4 });
  });

  it('refuses a body that is not JSON with a 400 that says so', async () => {
    await expect(readJsonBody(post('{"cc":'), schema)).rejects.toMatchObject({ code: 'BAD_REQUEST', status: 400 });
  });

  it('refuses another content type with 415', async () => {
    await expect(readJsonBody(post('cc=1', 'application/x-www-form-urlencoded'), schema)).rejects.toMatchObject({
      code: 'UNSUPPORTED_MEDIA_TYPE',
      status: 415,
    });
  });

  it('names each invalid field by its path', async () => {
    const error = await readJsonBody(post('{"cc":-1,"firmId":"x"}'), schema).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const issues = (error as ApiError).issues ?? [];
    expect(issues).toContainEqual({ path: 'cc', message: 'Cc must be positive.' });
    expect(issues.some((issue) => issue.message.includes('firmId'))).toBe(true);
  });
});
