import { z } from 'zod';

/** limit/offset from a query string, with the bounds the API documents. */
export const pageQuerySchema = z.strictObject({
  limit: z.coerce
    .number({ error: 'limit must be a number.' })
    .int('limit must be a whole number.')
    .min(1, 'limit is at least 1.')
    .max(200, 'limit is at most 200.')
    .default(50),
  offset: z.coerce
    .number({ error: 'offset must be a number.' })
    .int('offset must be a whole number.')
    .min(0, 'offset cannot be negative.')
    .default(0),
});
