import { createHmac } from 'node:crypto';

/**
 * A test record's secret masking key (src/lib/statistics/masking.ts): the first 4 bytes of
 * HMAC-SHA-256 under the bank's long-lived record-key secret, of the record id's text, as an unsigned
 * 32-bit number. The statistics query computes the same key in PostgreSQL (pgcrypto's hmac) while it
 * streams; this copy is for small sets and for checking that the two agree. The secret must never
 * change: a new secret gives every test a new mask, and two masks of one test can be averaged.
 */
export function recordKeyOf(secret: string, recordId: string): number {
  return createHmac('sha256', secret).update(recordId).digest().readUInt32BE(0);
}
