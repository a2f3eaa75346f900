import { z } from 'zod';
import { MAX_ROWS } from '../import/limits';

/**
 * A partner script's JSON upload: rows keyed by the import field keys (see the CSV template's column
 * guide), values in the bank's SI units, numbers as JSON numbers. Row numbers in errors are positions
 * in `rows`, starting at 1.
 */
export const partnerJsonUploadSchema = z.strictObject({
  fileName: z.string().trim().max(200).optional(),
  rows: z
    .array(z.record(z.string(), z.union([z.string(), z.number(), z.null()])), {
      error: 'rows must be a list of objects keyed by field.',
    })
    .min(1, 'Send at least one row.')
    .max(MAX_ROWS, `Send at most ${MAX_ROWS} rows per upload.`),
});
