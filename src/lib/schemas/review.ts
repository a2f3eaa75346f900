import { z } from 'zod';

const comment = z
  .string()
  .trim()
  .min(1, 'Write a comment the contributor can act on.')
  .max(2000, 'Use at most 2,000 characters.');

/** A steward's decision on a whole submission, with optional comments on single records. */
export const reviewDecisionSchema = z
  .strictObject({
    action: z.enum(['accept', 'return', 'reject'], { error: 'Choose accept, return or reject.' }),
    comment: comment.optional(),
    recordComments: z
      .array(
        z.strictObject({ recordId: z.uuid({ error: 'recordId must be the id of a record in this submission.' }), comment }),
        {
          error: 'recordComments must be a list of { recordId, comment }.',
        },
      )
      .max(10000)
      .optional(),
  })
  .superRefine((decision, ctx) => {
    const perRecord = decision.recordComments?.length ?? 0;
    if (decision.action === 'accept' && perRecord > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['recordComments'],
        message: 'Accepting publishes every record; return the submission to ask for corrections.',
      });
    }
    if (decision.action === 'return' && !decision.comment && perRecord === 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['comment'],
        message: 'Say what to correct: a comment on the submission or on at least one record.',
      });
    }
    if (decision.action === 'reject' && !decision.comment) {
      ctx.addIssue({ code: 'custom', path: ['comment'], message: 'Say why the submission is rejected.' });
    }
  });

export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;
