// Every route against bad input: malformed path parameters (empty, not a uuid, an encoded NUL, 10 kB)
// on every route with one, and NUL characters, unpaired surrogates, deep nesting, oversized bodies,
// extra keys and wrong methods on every write route. Each answer is a 4xx in the one error shape,
// never a 500, and a row count of every table before and after shows that nothing was stored.
// The routes come from the same inventory as the access matrix, so a new route is probed by itself.
// source: OWASP ASVS 5.0 §2.3.3 (an operation succeeds whole or not at all), §4.1 / §15.3.3 (strict
// bodies, mass assignment), §5.2.1 (sizes the app can process), §16.5.1 (generic errors, no 500
// internals); RFC 9110 §15.5.6 (405 carries Allow), §9.3.7 (OPTIONS); The Unicode Standard 15.0 §3.9
// D91 (an unpaired surrogate is ill-formed); PostgreSQL 15 docs §8.3 (text cannot hold NUL).
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ERROR_STATUS } from '../../src/lib/server/http/api-error';
import { testEnv } from '../support/env';
import { makeSubmittedSubmission } from './support/fixtures';
import { bodyKindOf, deeplyNested, fillPattern, paramsOf, rowCounts, WRITE_METHODS } from './support/probes';
import { routeInventory } from './support/route-inventory';
import { base, call, ctx, db, inTenantTransaction, makePerson, sessionCookie, userIdOf } from './support/world';

const superUrl = testEnv('CLAYBANK_TEST_SUPER_URL');
const OVERSIZE_BYTES = 25 * 1024 * 1024;
const MALFORMED_IDS = [
  ['empty', ''],
  ['not a uuid', 'not-a-uuid'],
  ['encoded NUL', '%00'],
  ['10 kB', 'x'.repeat(10_240)],
] as const;

const routes = routeInventory().filter((route) => !route.startsWith('PAGE '));
const withParams = routes.filter((route) => paramsOf(route.split(' ')[1] as string).length > 0);
const writeRoutes = routes.filter((route) => {
  const method = route.split(' ')[0] as string;
  return method === 'ALL' || (WRITE_METHODS as readonly string[]).includes(method);
});

let owner = '';
let steward = '';
let invitee = '';
let keySecret = '';
let countsBefore: Record<string, number> = {};
const ids: Record<string, string> = {};

interface Caller {
  cookie: string | null;
  headers?: Record<string, string>;
}

/** Who asks: someone allowed to use the route, so the refusal is about the input and not the caller. */
function callerFor(pattern: string): Caller {
  if (/^\/api\/(review|vocabulary)/.test(pattern)) return { cookie: steward };
  if (pattern.startsWith('/api/invitations/')) return { cookie: invitee };
  if (pattern.startsWith('/api/partner/')) return { cookie: null, headers: { 'x-api-key': keySecret } };
  if (/^\/api\/session\/(sign-in|sign-up|forgot-password|reset-password)$/.test(pattern)) return { cookie: null };
  return { cookie: owner };
}

/** Real targets of the caller's own, so a probe that got past the input check would act on something. */
function paramValues(pattern: string): Record<string, string> {
  const byPrefix: [RegExp, Record<string, string>][] = [
    [/^\/api\/submissions\//, { id: ids.submission as string, recordId: ids.record as string }],
    [/^\/api\/review\//, { id: ids.submission as string }],
    [/^\/api\/records\//, { id: ids.record as string }],
    [/^\/api\/(firm\/)?invitations\//, { id: ids.invitation as string }],
    [/^\/api\/firm\/members\//, { memberId: ids.member as string }],
    [/^\/api\/firm\/api-keys\//, { id: ids.key as string }],
    [/^\/api\/vocabulary\/regions\//, { id: ids.region as string }],
    [/^\/api\/vocabulary\/units\//, { id: ids.unit as string }],
    [/^\/api\/auth\/reset-password\//, { token: 'probe-token' }],
  ];
  const known = byPrefix.find(([prefix]) => prefix.test(pattern))?.[1] ?? {};
  return Object.fromEntries(
    paramsOf(pattern).map((name) => [name, known[name] ?? (name === 'path' || name === 'all' ? 'nothing-here' : randomUUID())]),
  );
}

/** A body the route would accept, so that a malformed id is what gets refused. */
const VALID_BODIES: Record<string, unknown> = {
  'PATCH /api/firm/members/:memberId': { role: 'contributor' },
  'PATCH /api/submissions/:id/records/:recordId': { values: { compressionIndex: 0.8 } },
  'PATCH /api/vocabulary/regions/:id': { description: 'Probe (invented).' },
  'PATCH /api/vocabulary/units/:id': { description: 'Probe (invented).' },
  'POST /api/review/:id/decision': { action: 'reject', comment: 'Probe.' },
};

interface Answer {
  status: number;
  text: string;
  allow: string | null;
}

async function send(method: string, path: string, caller: Caller, body?: BodyInit, contentType?: string): Promise<Answer> {
  const response = await fetch(`${base}${path}`, {
    method,
    redirect: 'manual',
    headers: {
      origin: base,
      ...(caller.cookie ? { cookie: caller.cookie } : {}),
      ...(contentType ? { 'content-type': contentType } : {}),
      ...caller.headers,
    },
    body,
    ...(body instanceof ReadableStream ? { duplex: 'half' } : {}),
  } as RequestInit);
  return { status: response.status, text: await response.text(), allow: response.headers.get('allow') };
}

/** A 4xx in the one error shape; returns the error for further checks. */
function expectRefusal(answer: Answer, status?: number) {
  expect(answer.status, answer.text.slice(0, 300)).toBeGreaterThanOrEqual(400);
  expect(answer.status, answer.text.slice(0, 300)).toBeLessThan(500);
  if (status !== undefined) expect(answer.status, answer.text.slice(0, 300)).toBe(status);
  const error = (JSON.parse(answer.text) as { error: { code: keyof typeof ERROR_STATUS; message: string } }).error;
  expect(ERROR_STATUS[error.code]).toBe(answer.status);
  expect(error.message.length).toBeGreaterThan(10);
  return error;
}

/** A body that grows past every limit without announcing its length (chunked). */
function endlessStream(totalBytes: number): ReadableStream<Uint8Array> {
  const piece = new Uint8Array(64 * 1024).fill(0x20);
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent >= totalBytes) return controller.close();
      sent += piece.byteLength;
      controller.enqueue(piece);
    },
  });
}

beforeAll(async () => {
  const person = await makePerson('probe-owner');
  const firm = await ctx.auth.api.createOrganization({
    body: { name: 'Probe firm (invented)', slug: `probe-${Date.now()}`, userId: person.id },
  });
  if (!firm) throw new Error('no firm');
  owner = await sessionCookie(person.id);
  steward = await sessionCookie(await userIdOf('steward@example.test'));

  const colleague = await makePerson('probe-colleague', { id: firm.id, role: 'engineer' });
  ids.member = (
    await db
      .selectFrom('member')
      .select('id')
      .where('userId', '=', colleague.id)
      .where('organizationId', '=', firm.id)
      .executeTakeFirstOrThrow()
  ).id;
  const guest = await makePerson('probe-invitee');
  invitee = await sessionCookie(guest.id);
  const invited = await call('POST', '/api/firm/invitations', owner, { email: guest.email, role: 'engineer' });
  ids.invitation = String((invited.body as { invitation: { id: string } }).invitation.id);
  const key = await call('POST', '/api/firm/api-keys', owner, { name: 'probe script' });
  keySecret = String((key.body as { secret: string }).secret);
  ids.key = String((key.body as { key: { id: string } }).key.id);

  ids.submission = await makeSubmittedSubmission(firm.id);
  ids.record = (
    await inTenantTransaction(db, { firmId: firm.id, platformRole: 'user' }, (trx) =>
      trx
        .selectFrom('test_record')
        .select('id')
        .where('submission_id', '=', ids.submission as string)
        .executeTakeFirstOrThrow(),
    )
  ).id;
  const vocabulary = (await call('GET', '/api/vocabulary', steward)).body as {
    regions: { id: string }[];
    units: { id: string }[];
  };
  ids.region = String(vocabulary.regions[0]?.id);
  ids.unit = String(vocabulary.units[0]?.id);

  countsBefore = await rowCounts(superUrl);
}, 60_000);

afterAll(() => db.destroy());

describe('malformed path parameters', () => {
  for (const route of withParams) {
    const [method, pattern] = route.split(' ') as [string, string];
    const methods = method === 'ALL' ? ['GET', 'POST'] : [method];
    for (const param of paramsOf(pattern)) {
      for (const [what, value] of MALFORMED_IDS) {
        for (const asMethod of methods) {
          // An empty last segment names the collection itself (`/api/records/` is `/api/records`): not a malformed id.
          const parent = pattern.slice(0, pattern.lastIndexOf('/'));
          if (value === '' && pattern.endsWith(`:${param}`) && routes.includes(`${asMethod} ${parent}`)) continue;
          it(`${asMethod} ${pattern}: ${param} ${what} → 4xx`, async () => {
            const path = fillPattern(pattern, paramValues(pattern), { param, value });
            const body = VALID_BODIES[route];
            const answer = await send(
              asMethod,
              path,
              callerFor(pattern),
              body === undefined ? undefined : JSON.stringify(body),
              body === undefined ? undefined : 'application/json',
            );
            expectRefusal(answer);
          });
        }
      }
    }
  }
});

describe('bad bodies on every write route', () => {
  for (const route of writeRoutes) {
    const [method, pattern] = route.split(' ') as [string, string];
    const kind = bodyKindOf(route);
    const asMethod = method === 'ALL' ? 'POST' : method;
    const path = () => fillPattern(pattern, paramValues(pattern));
    const caller = () => callerFor(pattern);
    /** The status every probe gets on a catch-all (no such endpoint), or the one named. */
    const expected = (status: number) => (kind === 'catch-all' ? 404 : status);

    /** Sends text where the route takes it: the JSON body, or the options of an upload form. */
    const sendText = (json: string) => {
      if (kind !== 'multipart') return send(asMethod, path(), caller(), json, 'application/json');
      const form = new FormData();
      form.append('file', new Blob(['Borehole / location id,Depth top (m)\nP-1,1\n']), 'probe.csv');
      form.append('options', json);
      return send(asMethod, path(), caller(), form);
    };
    const field = kind === 'partner' ? 'fileName' : kind === 'multipart' ? 'region' : 'name';

    describe(`${asMethod} ${pattern} (${kind})`, () => {
      it('a NUL character → 400 naming the field', async () => {
        const error = expectRefusal(await sendText(`{"${field}":"Quay\\u0000side"}`), expected(400));
        if (kind !== 'catch-all') expect(JSON.stringify(error)).toContain(field);
      });

      it('an unpaired surrogate → 400 naming the field', async () => {
        const error = expectRefusal(await sendText(`{"${field}":"clay \\ud800"}`), expected(400));
        if (kind !== 'catch-all') expect(JSON.stringify(error)).toContain(field);
      });

      it('10,000 levels of nesting (20 kB, under every size limit) → 400', async () => {
        expectRefusal(await sendText(deeplyNested(field, 10_000)), expected(400));
      });

      it('a 25 MB body → 413', async () => {
        const big = `{"${field}":"${'x'.repeat(OVERSIZE_BYTES)}"}`;
        if (kind === 'multipart') {
          const form = new FormData();
          form.append('file', new Blob([big]), 'big.csv');
          expectRefusal(await send(asMethod, path(), caller(), form), expected(413));
        } else {
          expectRefusal(await send(asMethod, path(), caller(), big, 'application/json'), expected(413));
        }
      });

      it('a body past the limit with no Content-Length (chunked) → 413', async () => {
        const type = kind === 'multipart' ? 'multipart/form-data; boundary=probe' : 'application/json';
        expectRefusal(await send(asMethod, path(), caller(), endlessStream(OVERSIZE_BYTES), type), expected(413));
      });

      it('a key the caller may not set → 400 naming it', async () => {
        // ownerId: a key no route takes; a partner row may not carry firmId either.
        const [extra, key] = kind === 'partner' ? ['{"rows":[{"firmId":"x"}]}', 'firmId'] : ['{"ownerId":"x"}', 'ownerId'];
        const error = expectRefusal(await sendText(extra), expected(400));
        if (kind !== 'catch-all') expect(JSON.stringify(error)).toContain(key);
        if (kind === 'multipart') {
          const form = new FormData();
          form.append('file', new Blob(['Borehole / location id\nP-1\n']), 'probe.csv');
          form.append('firmId', 'x');
          const fieldError = expectRefusal(await send(asMethod, path(), caller(), form), 400);
          expect(JSON.stringify(fieldError)).toContain('firmId');
        }
      });

      if (method !== 'ALL') {
        it('a method the route does not take → 405 with Allow; OPTIONS → 204 with Allow', async () => {
          const answer = await send('PUT', path(), caller(), '{}', 'application/json');
          const error = expectRefusal(answer, 405);
          expect(error.code).toBe('METHOD_NOT_ALLOWED');
          expect(answer.allow?.split(', ')).toContain(method);
          const options = await send('OPTIONS', path(), caller());
          expect(options.status).toBe(204);
          expect(options.allow?.split(', ')).toContain(method);
        });
      }
    });
  }
});

describe('afterwards', () => {
  it('nothing was stored: every table holds as many rows as before the probes', async () => {
    expect(await rowCounts(superUrl)).toEqual(countsBefore);
  });
});
