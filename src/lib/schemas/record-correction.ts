import { z } from 'zod';
import { IMPORT_FIELDS } from '../import/fields';

const EDITABLE = new Set<string>(IMPORT_FIELDS.map((f) => f.key));

/**
 * Corrections to one returned record: import field keys, values in the bank's SI units. The keys are
 * checked as sent, before parsing, so a `__proto__` or other unknown key is refused rather than dropped.
 */
export const recordCorrectionSchema = z.strictObject({
  values: z
    .unknown()
    .superRefine((raw, ctx) => {
      if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return;
      for (const key of Object.keys(raw)) {
        if (!EDITABLE.has(key))
          ctx.addIssue({ code: 'custom', path: [key], message: `"${key}" is not a field of a test record.` });
      }
    })
    .pipe(
      z.record(z.string(), z.union([z.number(), z.string(), z.null()], { error: 'Each value must be a number, text or null.' }), {
        error: 'values must be an object of field: value.',
      }),
    ),
});

export type RecordCorrection = z.infer<typeof recordCorrectionSchema>;
