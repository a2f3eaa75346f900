// Methods an endpoint does not serve: 405 with the methods it does serve in Allow.
// source: RFC 9110 §15.5.6 (405 Method Not Allowed "MUST generate an Allow header field"), §9.3.2
// (HEAD is GET without content), §9.3.7 (OPTIONS describes the methods of a resource).
import type { MiddlewareHandler } from 'astro';
import { describe, expect, it } from 'vitest';
import { matchLibraryRoute } from '../../../src/lib/server/auth/library-routes';
import { allowedMethods, methodGuard } from '../../../src/lib/server/http/method-guard';

const handler = () => new Response(null);

describe('allowedMethods', () => {
  it('lists the exported handlers, HEAD beside GET, and OPTIONS', () => {
    expect(allowedMethods({ GET: handler, POST: handler, prerender: false })).toEqual(['GET', 'POST', 'HEAD', 'OPTIONS']);
    expect(allowedMethods({ PATCH: handler, DELETE: handler })).toEqual(['PATCH', 'DELETE', 'OPTIONS']);
  });

  it('leaves a catch-all (ALL) to decide for itself', () => {
    expect(allowedMethods({ ALL: handler })).toBeNull();
  });
});

describe('the library routes that stay reachable', () => {
  it('matches the mail links only, by method and path', () => {
    expect(matchLibraryRoute('GET', '/api/auth/verify-email')).toMatchObject({ route: { path: '/api/auth/verify-email' } });
    expect(matchLibraryRoute('GET', '/api/auth/reset-password/abc123')).toMatchObject({
      route: { path: '/api/auth/reset-password/:token' },
      params: { token: 'abc123' },
    });
    expect(matchLibraryRoute('POST', '/api/auth/verify-email')).toEqual({ allow: ['GET', 'OPTIONS'] });
    expect(matchLibraryRoute('HEAD', '/api/auth/verify-email')).toEqual({ allow: ['GET', 'OPTIONS'] });
  });

  it('exposes nothing else', () => {
    for (const path of [
      '/api/auth/get-session',
      '/api/auth/sign-in/email',
      '/api/auth/request-password-reset',
      '/api/auth/organization/list-invitations',
      '/api/auth/organization/update-member-role',
      '/api/auth/reset-password',
      '/api/auth/reset-password/',
      '/api/auth/reset-password/a/b',
      '/api/auth/verify-email/extra',
    ]) {
      expect(matchLibraryRoute('GET', path), path).toBeNull();
      expect(matchLibraryRoute('POST', path), path).toBeNull();
    }
  });
});

describe('methodGuard', () => {
  const modules = { './pages/api/firm/members/[memberId].ts': async () => ({ PATCH: handler, DELETE: handler }) };
  const run = async (method: string, routePattern: string) => {
    const context = {
      url: new URL('http://127.0.0.1/api/firm/members/m1'),
      routePattern,
      request: new Request('http://127.0.0.1/', { method }),
    };
    const next = async () => new Response('passed on', { status: 200 });
    return (await methodGuard(modules)(context as unknown as Parameters<MiddlewareHandler>[0], next)) as Response;
  };

  it('answers a method the endpoint does not export with 405, Allow and the error shape', async () => {
    // Astro hands middleware the route pattern in lower case.
    const answer = await run('PUT', '/api/firm/members/[memberid]');
    expect(answer.status).toBe(405);
    expect(answer.headers.get('allow')).toBe('PATCH, DELETE, OPTIONS');
    expect(await answer.json()).toMatchObject({ error: { code: 'METHOD_NOT_ALLOWED' } });
  });

  it('answers OPTIONS with 204 and Allow, and passes an exported method on', async () => {
    const options = await run('OPTIONS', '/api/firm/members/[memberid]');
    expect(options.status).toBe(204);
    expect(options.headers.get('allow')).toBe('PATCH, DELETE, OPTIONS');
    expect((await run('DELETE', '/api/firm/members/[memberid]')).status).toBe(200);
  });
});
