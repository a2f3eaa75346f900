// Sign-in protections: rate limits that hold for our own server-side calls and cannot be reset by a
// spoofed header, answers that do not reveal whether an account exists, and sessions revoked by a
// password reset.
// source: OWASP ASVS 5.0 §6.3.1 (brute force), §6.3.8 (enumeration), §7.4.3 (revoke sessions on
// password change); OWASP Authentication cheat sheet (lock out on failed attempts, per account);
// better-auth docs, rate-limit special rules (3 requests per 10 s on /sign-in).
import { afterAll, describe, expect, it } from 'vitest';
import { testEnv } from '../support/env';
import { call, ctx, db, makePerson, sessionCookie } from './support/world';

const inbox = testEnv('CLAYBANK_TEST_INBOX_URL');
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
/** Waits out the 10 s sign-in/sign-up window, so each test starts with a fresh allowance. */
const freshWindow = () => pause(10_500);

async function latestMailTo(address: string): Promise<{ subject: string; text: string }> {
  for (let attempt = 0; attempt < 40; attempt++) {
    const { messages } = (await (await fetch(`${inbox}/messages?to=${encodeURIComponent(address)}`)).json()) as {
      messages: { subject: string; text: string }[];
    };
    if (messages[0]) return messages[0];
    await pause(250);
  }
  throw new Error(`no mail reached ${address}`);
}

afterAll(async () => {
  await freshWindow();
  await db.destroy();
});

describe('sign-in rate limit', () => {
  it('answers the 4th failed sign-in within 10 s from one address with 429, and a spoofed client header does not reset it', async () => {
    await freshWindow();
    const attempt = (headers: Record<string, string> = {}) =>
      call('POST', '/api/session/sign-in', null, { email: 'owner@quillfen.example.test', password: 'not-the-password' }, headers);
    const statuses = [(await attempt()).status, (await attempt()).status, (await attempt()).status];
    expect(statuses).toEqual([401, 401, 401]);
    const fourth = await attempt();
    expect(fourth.status).toBe(429);
    expect(fourth.body).toMatchObject({ error: { code: 'RATE_LIMITED' } });
    const spoofed = await attempt({ 'x-forwarded-for': '203.0.113.9', 'x-claybank-client-ip': '198.51.100.4' });
    expect(spoofed.status).toBe(429);
    // The failures were counted against the socket's address, never against an address the client wrote.
    const buckets = await db
      .selectFrom('rate_limit_bucket')
      .select('key')
      .where('key', 'like', 'sign-in-failed:address:%')
      .execute();
    expect(buckets.map((b) => b.key).filter((key) => /203\.0\.113\.9|198\.51\.100\.4/.test(key))).toEqual([]);
    expect(buckets.some((b) => /127\.0\.0\.1|::1/.test(b.key))).toBe(true);
  });

  it("cannot be got round through the sign-in library's own route, which is not exposed", async () => {
    const direct = await call('POST', '/api/auth/sign-in/email', null, {
      email: 'nobody@example.test',
      password: 'not-the-password',
    });
    expect(direct.status).toBe(404);
    expect(direct.body).toMatchObject({ error: { code: 'NOT_FOUND' } });
  });

  it('counts only failures: 6 different people sign in from one address within 10 s', async () => {
    await freshWindow();
    const people = await Promise.all([1, 2, 3, 4, 5, 6].map((n) => makePerson(`office-${n}`)));
    const started = Date.now();
    const statuses = [];
    for (const person of people) {
      statuses.push(
        (await call('POST', '/api/session/sign-in', null, { email: person.email, password: 'matrix-test-password' })).status,
      );
    }
    expect(Date.now() - started).toBeLessThan(10_000);
    expect(statuses).toEqual([200, 200, 200, 200, 200, 200]);
  });
});

describe('answers that do not reveal whether an account exists', () => {
  it('sign-in: a known address with a wrong password and an unknown address get the same answer', async () => {
    await freshWindow();
    const known = await call('POST', '/api/session/sign-in', null, {
      email: 'engineer@quillfen.example.test',
      password: 'wrong-password-1',
    });
    const unknown = await call('POST', '/api/session/sign-in', null, {
      email: 'no-such-person@example.test',
      password: 'wrong-password-1',
    });
    expect(known.status).toBe(401);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
  });

  it('sign-up: an address in use and a new address get the same answer (the owner of the address is told by mail)', async () => {
    await freshWindow();
    const taken = await call('POST', '/api/session/sign-up', null, {
      name: 'Someone',
      email: 'estimator@quillfen.example.test',
      password: 'a-long-password-1',
    });
    const fresh = await call('POST', '/api/session/sign-up', null, {
      name: 'Someone',
      email: `new.${Date.now()}@example.test`,
      password: 'a-long-password-1',
    });
    expect(taken.status).toBe(200);
    expect(fresh.status).toBe(taken.status);
    expect(fresh.body).toEqual(taken.body);
    expect((await latestMailTo('estimator@quillfen.example.test')).subject).toContain('tried to sign up');
  });

  it('password reset: a known and an unknown address get the same answer', async () => {
    const known = await call('POST', '/api/session/forgot-password', null, { email: 'contributor@quillfen.example.test' });
    const unknown = await call('POST', '/api/session/forgot-password', null, { email: 'no-such-person@example.test' });
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(unknown.body).toEqual(known.body);
  });
});

describe('password reset', () => {
  it('revokes every session of the person and the link works once', async () => {
    const person = await makePerson('resetter');
    const phone = await sessionCookie(person.id);
    const laptop = await sessionCookie(person.id);
    expect((await call('GET', '/api/vocabulary', phone)).status).toBe(200);

    await ctx.auth.api.requestPasswordReset({ body: { email: person.email, redirectTo: '/reset-password' } });
    const mail = await latestMailTo(person.email);
    const link = /https?:\/\/\S+/.exec(mail.text)?.[0] ?? '';
    const tokenPage = await fetch(link, { redirect: 'manual' });
    const token = new URL(tokenPage.headers.get('location') ?? '', 'http://x').searchParams.get('token') ?? '';
    expect(token).not.toBe('');

    const reset = await call('POST', '/api/session/reset-password', null, { token, password: 'a-brand-new-password' });
    expect(reset.status).toBe(200);
    expect((await call('GET', '/api/vocabulary', phone)).status).toBe(401);
    expect((await call('GET', '/api/vocabulary', laptop)).status).toBe(401);
    // A second use of the same link is refused (checked server-side, so the reset allowance is not spent).
    await expect(ctx.auth.api.resetPassword({ body: { token, newPassword: 'another-new-password' } })).rejects.toThrow();
  });
});
