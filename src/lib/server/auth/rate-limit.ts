import type { Kysely } from 'kysely';
import { sql } from 'kysely';
import type { Database } from '../db/schema';

export interface RateLimitRule {
  /** seconds */
  window: number;
  max: number;
}

export interface RateLimitDecision {
  allowed: boolean;
  /** seconds until the window frees up, when refused */
  retryAfter: number | null;
}

export interface RateLimitStorage {
  consume(key: string, rule: RateLimitRule): Promise<RateLimitDecision>;
  /** Takes one use back out of each counter (never below zero), e.g. for an attempt that turned out fine. */
  giveBack(keys: readonly string[]): Promise<void>;
}

/**
 * Fixed-window counters in PostgreSQL, shared by every app server: one atomic upsert per request.
 * better-auth uses it for its own routes, and our endpoints use it around server-side auth calls
 * (which better-auth does not limit).
 */
export function databaseRateLimiter(db: Kysely<Database>): RateLimitStorage {
  return {
    async consume(key, rule) {
      const nowMs = Date.now();
      const windowMs = rule.window * 1000;
      const { rows } = await sql<{ count: number; window_started_ms: number }>`
        insert into rate_limit_bucket as b (key, window_started_ms, count)
        values (${key}, ${nowMs}, 1)
        on conflict (key) do update set
          count = case when b.window_started_ms <= ${nowMs - windowMs} then 1 else b.count + 1 end,
          window_started_ms = case when b.window_started_ms <= ${nowMs - windowMs} then ${nowMs} else b.window_started_ms end
        returning count, window_started_ms`.execute(db);
      const row = rows[0];
      if (!row || row.count <= rule.max) return { allowed: true, retryAfter: null };
      return { allowed: false, retryAfter: Math.max(1, Math.ceil((row.window_started_ms + windowMs - nowMs) / 1000)) };
    },
    async giveBack(keys) {
      if (keys.length === 0) return;
      await db
        .updateTable('rate_limit_bucket')
        .set({ count: sql<number>`greatest(count - 1, 0)` })
        .where('key', 'in', [...keys])
        .execute();
    },
  };
}
