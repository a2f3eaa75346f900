import { type Kysely, sql } from 'kysely';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import type { RateLimitRule, RateLimitStorage } from './rate-limit';

/**
 * Failed sign-ins allowed per window: per account (3 in 10 s, then 429 until the window ends) and per
 * client address (a wider allowance, so one office behind one address can mistype a few passwords).
 * Successful sign-ins are not counted, so a whole office can sign in together.
 */
export const FAILED_SIGN_IN_LIMITS = {
  account: { window: 10, max: 3 },
  address: { window: 60, max: 20 },
} as const satisfies Record<string, RateLimitRule>;

const keyOf = {
  account: (email: string) => `sign-in-failed:account:${email}`,
  address: (ipAddress: string) => `sign-in-failed:address:${ipAddress}`,
};

export interface SignInAttempt {
  email: string;
  ipAddress: string;
}

/**
 * Counts the attempt before it is made (so parallel guesses cannot slip past the count), refusing
 * with 429 and Retry-After when the account or the address has used up its allowance of failures.
 * Call `forgiveSignIn` when the attempt succeeds: then only failures remain counted.
 */
export async function countSignInAttempt(limiter: RateLimitStorage, attempt: SignInAttempt): Promise<void> {
  const account = await limiter.consume(keyOf.account(attempt.email), FAILED_SIGN_IN_LIMITS.account);
  const address = await limiter.consume(keyOf.address(attempt.ipAddress), FAILED_SIGN_IN_LIMITS.address);
  if (account.allowed && address.allowed) return;
  const seconds = String(Math.max(account.retryAfter ?? 0, address.retryAfter ?? 0, 1));
  throw new ApiError('RATE_LIMITED', `Too many failed sign-ins. Wait ${seconds} s and try again.`, undefined, {
    'retry-after': seconds,
  });
}

/** Takes a successful attempt back out of both counts. */
export async function forgiveSignIn(db: Kysely<Database>, attempt: SignInAttempt): Promise<void> {
  const keys = [keyOf.account(attempt.email), keyOf.address(attempt.ipAddress)];
  await db
    .updateTable('rate_limit_bucket')
    .set({ count: sql<number>`greatest(count - 1, 0)` })
    .where('key', 'in', keys)
    .execute();
}
