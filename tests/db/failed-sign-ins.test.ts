// The sign-in allowance counts failures, per account and per client address, on the shared counters
// in PostgreSQL; successes are taken back out, so an office behind one address signs in together.
// source: OWASP ASVS 5.0 §6.3.1 (brute-force controls); OWASP Authentication cheat sheet, "Protect
// against automated attacks" (lockout counted per account, on failed attempts).
import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { countSignInAttempt, FAILED_SIGN_IN_LIMITS, forgiveSignIn } from '../../src/lib/server/auth/failed-sign-ins';
import { databaseRateLimiter } from '../../src/lib/server/auth/rate-limit';
import { connectDatabase } from '../../src/lib/server/db/connect';
import { RateLimitedError } from '../../src/lib/server/errors';
import { ERROR_STATUS } from '../../src/lib/server/http/api-error';
import { toHttpError } from '../../src/lib/server/http/error-mapper';
import { testEnv } from '../support/env';

const app = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 4 });
const limiter = { rateLimiter: databaseRateLimiter(app.db) };
afterAll(() => app.db.destroy());

const someone = () => `person.${randomUUID().slice(0, 8)}@example.test`;
/** A client address of its own for each use (IPv6 documentation prefix, RFC 3849), so tests share no allowance. */
const anAddress = () => `2001:db8::${randomUUID().slice(0, 4)}:${randomUUID().slice(0, 4)}`;

async function outcome(attempt: { email: string; ipAddress: string }): Promise<number> {
  try {
    await countSignInAttempt(limiter, attempt);
    return 200;
  } catch (error) {
    const answer = error instanceof RateLimitedError ? toHttpError(error) : null;
    if (answer) return ERROR_STATUS[answer.code];
    throw error;
  }
}

describe('failed sign-ins', () => {
  it('refuses an account after 3 failures in 10 s, with Retry-After within the window', async () => {
    const attempt = { email: someone(), ipAddress: anAddress() };
    const statuses = [];
    for (let i = 0; i < 5; i++) statuses.push(await outcome(attempt));
    expect(statuses).toEqual([200, 200, 200, 429, 429]);
    const refused = await countSignInAttempt(limiter, attempt).catch((e: unknown) => e);
    const seconds = Number(toHttpError(refused)?.headers?.['retry-after']);
    expect(seconds).toBeGreaterThanOrEqual(1);
    expect(seconds).toBeLessThanOrEqual(FAILED_SIGN_IN_LIMITS.account.window);
  });

  it('refuses an address after 20 failures spread over many accounts, even for an account it has not tried', async () => {
    const ipAddress = anAddress();
    const statuses = [];
    for (let i = 0; i < FAILED_SIGN_IN_LIMITS.address.max; i++) statuses.push(await outcome({ email: someone(), ipAddress }));
    expect(statuses.every((s) => s === 200)).toBe(true);
    expect(await outcome({ email: someone(), ipAddress })).toBe(429);
    expect(await outcome({ email: someone(), ipAddress: anAddress() })).toBe(200);
  });

  it('does not count successes: 50 sign-ins of one person from one address in a row all pass', async () => {
    const attempt = { email: someone(), ipAddress: anAddress() };
    for (let i = 0; i < 50; i++) {
      expect(await outcome(attempt)).toBe(200);
      await forgiveSignIn(limiter, attempt);
    }
  });

  it('lets only 3 of 12 parallel guesses at one account through', async () => {
    const email = someone();
    const statuses = await Promise.all(Array.from({ length: 12 }, () => outcome({ email, ipAddress: anAddress() })));
    expect(statuses.filter((s) => s === 200)).toHaveLength(3);
    expect(statuses.filter((s) => s === 429)).toHaveLength(9);
  });
});
