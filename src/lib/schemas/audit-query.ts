import { z } from 'zod';

/** Kinds of activity the log can be filtered by, each a set of action prefixes. */
export const AUDIT_KINDS = {
  'sign-in': { label: 'Signing in and out', prefixes: ['auth.'] },
  refused: { label: 'Refused requests', prefixes: ['permission.'] },
  submissions: { label: 'Uploads and corrections', prefixes: ['submission.', 'record.'] },
  bank: { label: 'Bank versions and vocabulary', prefixes: ['bank.', 'vocabulary.'] },
  firm: { label: 'Firm members, invitations and keys', prefixes: ['firm.'] },
  estimates: { label: 'Estimates', prefixes: ['estimate.'] },
  people: { label: 'People and settings', prefixes: ['person.', 'settings.'] },
} as const;
export type AuditKind = keyof typeof AUDIT_KINDS;
const KIND_KEYS = Object.keys(AUDIT_KINDS) as [AuditKind, ...AuditKind[]];

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Give the date as YYYY-MM-DD.')
  .refine((text) => !Number.isNaN(Date.parse(`${text}T00:00:00Z`)), 'Not a date in the calendar.');

/** `GET /api/audit`: a page of the log, filtered by person, kind and a range of days (UTC, both ends included). */
export const auditQuerySchema = z
  .strictObject({
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
    person: z
      .string()
      .regex(/^[A-Za-z0-9]{1,64}$/, 'person is the id of a person from the list.')
      .optional(),
    kind: z.enum(KIND_KEYS, { error: `kind is one of: ${KIND_KEYS.join(', ')}.` }).optional(),
    from: day.optional(),
    to: day.optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'from must not be after to.', path: ['to'] });
export type AuditQuery = z.infer<typeof auditQuerySchema>;
