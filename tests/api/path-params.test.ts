// Every id in a URL is checked before it reaches the database: a malformed id (not a uuid, an
// encoded NUL, 10 kB of text, empty) answers 404 in the one error shape, never 500, and stores nothing.
// source: OWASP ASVS 5.0 §1.2.4 and §2.2.1 (input validated against an allow-list before use);
// RFC 9562 §4 (uuid text form); RFC 9110 §15.5.5 (404 Not Found).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeInventory } from './support/route-inventory';
import { base, call, db, sessionCookie, userIdOf } from './support/world';

/** Who may reach each route's id check (the permission check comes first). */
const ACTOR: Record<string, 'owner' | 'steward'> = {
  '/api/review/:id': 'steward',
  '/api/review/:id/decision': 'steward',
  '/api/vocabulary/regions/:id': 'steward',
  '/api/vocabulary/units/:id': 'steward',
};

/** A body that fits each write route, so only the id can be at fault. */
const BODY: Record<string, unknown> = {
  'PATCH /api/firm/members/:memberId': { role: 'engineer' },
  'POST /api/review/:id/decision': { action: 'accept' },
  'PATCH /api/submissions/:id/records/:recordId': { values: { notes: 'checked' } },
  'PATCH /api/vocabulary/regions/:id': { description: 'checked' },
  'PATCH /api/vocabulary/units/:id': { description: 'checked' },
};

const MALFORMED: [label: string, segment: string][] = [
  ['not a uuid', 'not-a-uuid'],
  ['an encoded NUL', '%00'],
  ['an encoded NUL inside an id', `0190a8a0-0000-7000-8000-00000000000${'%00'}`],
  ['10 kB of text', 'a'.repeat(10_240)],
  ['a path-traversal attempt', '..%2F..%2Fhealth'],
];

const VALID_UUID = '0190a8a0-1234-7abc-8def-0123456789ab';
const VALID_AUTH_ID = 'AbCdEfGhIjKlMnOpQrStUvWxYz012345';
/** Routes whose ids better-auth made (32 letters and digits); every other id is a uuid. */
const AUTH_ID_ROUTES = new Set([
  '/api/firm/api-keys/:id',
  '/api/firm/invitations/:id',
  '/api/firm/members/:memberId',
  '/api/invitations/:id',
  '/api/invitations/:id/accept',
  '/api/invitations/:id/reject',
  '/api/auth/reset-password/:token',
]);

/**
 * The sign-in library's mail links: a well-formed token that names nothing (expired, used) forwards to
 * the page the mail link names, with the reason, as the library's link must; malformed ones are 404.
 */
const MAIL_LINK_PAGE: Record<string, string> = { '/api/auth/reset-password/:token': '/reset-password' };

const routes = routeInventory()
  .filter((route) => !route.startsWith('PAGE ') && !route.startsWith('ALL '))
  .filter((route) => /\/:\w+/.test(route));

const cookies = { owner: '', steward: '' };
let before: Record<string, number> = {};

const COUNTED = [
  'submission',
  'test_record',
  'region',
  'geological_unit',
  'estimate',
  'member',
  'invitation',
  'apikey',
  'audit_log',
] as const;

async function counts(): Promise<Record<string, number>> {
  const entries = await Promise.all(
    COUNTED.map(async (table) => {
      const { n } = await db
        .selectFrom(table)
        .select((eb) => eb.fn.countAll<number>().as('n'))
        .executeTakeFirstOrThrow();
      return [table, n] as const;
    }),
  );
  return Object.fromEntries(entries);
}

beforeAll(async () => {
  cookies.owner = await sessionCookie(await userIdOf('owner@quillfen.example.test'));
  cookies.steward = await sessionCookie(await userIdOf('steward@example.test'));
  before = await counts();
});

afterAll(async () => {
  expect(await counts()).toEqual(before);
  await db.destroy();
});

it('covers every route with a path parameter', () => {
  expect(routes.length).toBeGreaterThanOrEqual(15);
});

describe.each(routes.map((route) => [route]))('%s', (route) => {
  const [method = '', pattern = ''] = route.split(' ');
  const params = [...pattern.matchAll(/:(\w+)/g)].map((m) => m[1] ?? '');
  const valid = AUTH_ID_ROUTES.has(pattern) ? VALID_AUTH_ID : VALID_UUID;

  describe.each(params.map((param) => [param]))('with a malformed :%s', (param) => {
    it.each(MALFORMED)('%s answers 404 in the error shape', async (_label, segment) => {
      const path = pattern.replace(/:(\w+)/g, (_, name: string) => (name === param ? segment : valid));
      const body = BODY[route] ?? (method === 'GET' || method === 'DELETE' ? undefined : {});
      const result = await call(method, path, cookies[ACTOR[pattern] ?? 'owner'], body);
      expect(result.status, result.text.slice(0, 300)).toBe(404);
      expect(result.body).toMatchObject({ error: { code: 'NOT_FOUND', message: expect.any(String) } });
      expect(result.text.length).toBeLessThan(1000);
    });
  });

  const mailLinkPage = MAIL_LINK_PAGE[pattern];
  if (mailLinkPage) {
    it('a well-formed token that names nothing forwards to its page on this site, with the reason', async () => {
      const path = `${pattern.replace(/:\w+/g, valid)}?callbackURL=${mailLinkPage}`;
      const result = await call(method, path, null);
      expect(result.status, result.text.slice(0, 300)).toBe(302);
      const to = new URL(result.location ?? '', base);
      expect(to.origin).toBe(new URL(base).origin);
      expect(`${to.pathname}${to.search}`).toBe(`${mailLinkPage}?error=INVALID_TOKEN`);
    });
    return;
  }

  it('answers 404 for a well-formed id that names nothing', async () => {
    const path = pattern.replace(/:\w+/g, valid);
    const body = BODY[route] ?? (method === 'GET' || method === 'DELETE' ? undefined : {});
    const result = await call(method, path, cookies[ACTOR[pattern] ?? 'owner'], body);
    expect(result.status, result.text.slice(0, 300)).toBe(404);
    expect(result.body).toMatchObject({ error: { code: 'NOT_FOUND' } });
  });
});

describe('an empty id inside a path', () => {
  it.each([
    ['POST', '/api/submissions//resubmit'],
    ['POST', '/api/submissions//withdraw'],
    ['POST', '/api/invitations//accept'],
    ['POST', '/api/review//decision'],
    ['PATCH', `/api/submissions//records/${VALID_UUID}`],
  ])('%s %s answers 404 in the error shape', async (method, path) => {
    const result = await call(method, path, path.includes('review') ? cookies.steward : cookies.owner, {});
    expect(result.status, result.text.slice(0, 300)).toBe(404);
    expect(result.body).toMatchObject({ error: { code: 'NOT_FOUND' } });
  });
});
