import { z } from 'zod';
import { IMPORT_FIELDS } from '../import/fields';

const EDITABLE = new Set<string>(IMPORT_FIELDS.map((f) => f.key));

/** Corrections to one returned record: import field keys, values in the bank's SI units. */
export const recordCorrectionSchema = z.strictObject({
  values: z
    .record(z.string(), z.union([z.number(), z.string(), z.null()]), { error: 'values must be an object of field: value.' })
    .superRefine((values, ctx) => {
      for (const key of Object.keys(values)) {
        if (!EDITABLE.has(key))
          ctx.addIssue({ code: 'custom', path: [key], message: `"${key}" is not a field of a test record.` });
      }
    }),
});

export type RecordCorrection = z.infer<typeof recordCorrectionSchema>;
