import type { APIContext } from 'astro';
import type { RateLimitRule } from '../auth/rate-limit';
import { ApiError } from './api-error';

/** Limits on our own server-side auth calls (better-auth does not limit calls made through auth.api). */
export const AUTH_LIMITS = {
  'sign-up': { window: 10, max: 3 },
  /** per client address: a shared office network should not lock its people out of resets */
  'password-reset': { window: 60, max: 10 },
  /** per e-mail address: nobody's inbox gets flooded with reset links */
  'password-reset-mail': { window: 60, max: 3 },
} as const satisfies Record<string, RateLimitRule>;

/**
 * 429 with Retry-After when the allowance is used up. The key is the client address, or `subject`
 * (e.g. an e-mail address) when given.
 */
export async function enforceRateLimit(
  context: Pick<APIContext, 'clientAddress' | 'locals'>,
  name: keyof typeof AUTH_LIMITS,
  subject: string = context.clientAddress,
): Promise<void> {
  const decision = await context.locals.app.rateLimiter.consume(`${name}:${subject}`, AUTH_LIMITS[name]);
  if (!decision.allowed) {
    const seconds = String(decision.retryAfter ?? AUTH_LIMITS[name].window);
    throw new ApiError('RATE_LIMITED', `Too many attempts. Wait ${seconds} s and try again.`, undefined, {
      'retry-after': seconds,
    });
  }
}
