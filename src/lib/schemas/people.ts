import { z } from 'zod';

/** Searching the people or firms list: a few letters of a name or e-mail address, and a page. */
export const directoryQuerySchema = z.strictObject({
  q: z.string().trim().max(100, 'Search with at most 100 characters.').optional(),
  limit: z.coerce
    .number({ error: 'limit must be a number.' })
    .int('limit must be a whole number.')
    .min(1, 'limit is at least 1.')
    .max(100, 'limit is at most 100.')
    .default(25),
  offset: z.coerce
    .number({ error: 'offset must be a number.' })
    .int('offset must be a whole number.')
    .min(0, 'offset cannot be negative.')
    .default(0),
});
export type DirectoryQuery = z.infer<typeof directoryQuerySchema>;

/** Suspends a person (`suspended: true`, with the reason they will be told) or lifts the suspension. */
export const suspendPersonSchema = z
  .strictObject({
    suspended: z.boolean({ error: 'Say suspended: true with a reason, or suspended: false to lift a suspension.' }),
    reason: z.string().trim().max(300, 'Use at most 300 characters.').optional(),
  })
  .superRefine((input, context) => {
    if (input.suspended && (input.reason ?? '').length < 3) {
      context.addIssue({ code: 'custom', path: ['reason'], message: 'Say why, in a sentence the person will read.' });
    }
  });
export type SuspendPersonInput = z.infer<typeof suspendPersonSchema>;

/** Passes a firm's ownership to one of its members; the owner until now becomes a firm admin. */
export const passOwnershipSchema = z.strictObject({
  newOwnerMemberId: z
    .string({ error: 'Choose the member who becomes owner.' })
    .regex(/^[A-Za-z0-9]{1,64}$/, 'Choose the member who becomes owner from the list.'),
});
export type PassOwnershipInput = z.infer<typeof passOwnershipSchema>;
