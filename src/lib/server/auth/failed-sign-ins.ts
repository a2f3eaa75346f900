import type { AppServices } from '../app-services';
import { RateLimitedError } from '../errors';
import type { RateLimitRule } from './rate-limit';

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

type LimiterApp = Pick<AppServices, 'rateLimiter'>;

/**
 * Counts the attempt before it is made (so parallel guesses cannot slip past the count), refusing
 * with RateLimitedError (429 and Retry-After) when the account or the address has used up its
 * allowance of failures. Call `forgiveSignIn` when the attempt succeeds: then only failures remain counted.
 */
export async function countSignInAttempt(app: LimiterApp, attempt: SignInAttempt): Promise<void> {
  const account = await app.rateLimiter.consume(keyOf.account(attempt.email), FAILED_SIGN_IN_LIMITS.account);
  const address = await app.rateLimiter.consume(keyOf.address(attempt.ipAddress), FAILED_SIGN_IN_LIMITS.address);
  if (account.allowed && address.allowed) return;
  const seconds = Math.max(account.retryAfter ?? 0, address.retryAfter ?? 0, 1);
  throw new RateLimitedError(`Too many failed sign-ins. Wait ${seconds} s and try again.`, seconds);
}

/** Takes a successful attempt back out of both counts. */
export async function forgiveSignIn(app: LimiterApp, attempt: SignInAttempt): Promise<void> {
  await app.rateLimiter.giveBack([keyOf.account(attempt.email), keyOf.address(attempt.ipAddress)]);
}
