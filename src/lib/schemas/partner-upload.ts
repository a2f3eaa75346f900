import { z } from 'zod';
import { IMPORT_FIELDS } from '../import/fields';
import { MAX_ROWS } from '../import/limits';

const FIELD_KEYS = new Set<string>(IMPORT_FIELDS.map((f) => f.key));

/** Keys the bank sets itself; a row that carries one is refused rather than having it ignored. */
export const KEYS_THE_BANK_SETS = ['id', 'firmId', 'status', 'publishedAt', 'bankVersion', 'submissionId', 'ownerId'] as const;
const BANK_SET = new Set<string>(KEYS_THE_BANK_SETS);

/** Every key of every row, checked as sent (before parsing drops anything), with the row counted from 1. */
function checkRowKeys(rows: unknown, ctx: z.RefinementCtx) {
  if (!Array.isArray(rows)) return;
  rows.forEach((row, index) => {
    if (typeof row !== 'object' || row === null || Array.isArray(row)) return;
    for (const key of Object.keys(row)) {
      if (FIELD_KEYS.has(key)) continue;
      const message = BANK_SET.has(key)
        ? `"${key}" is set by the bank, not by an upload. Remove it from row ${index + 1}.`
        : `"${key}" is not a field of a test record (row ${index + 1}). The template's column guide lists the field keys.`;
      ctx.addIssue({ code: 'custom', path: [index + 1, key], message });
    }
  });
}

/**
 * A partner script's JSON upload: rows keyed by the import field keys (see the CSV template's column
 * guide), values in the bank's SI units, numbers as JSON numbers. Row numbers in errors are positions
 * in `rows`, starting at 1. A key that is not a field (a firm, status or id above all) refuses the upload.
 */
export const partnerJsonUploadSchema = z.strictObject({
  fileName: z.string().trim().max(200).optional(),
  rows: z
    .unknown()
    .superRefine(checkRowKeys)
    .pipe(
      z
        .array(z.record(z.string(), z.union([z.string(), z.number(), z.null()])), {
          error: 'rows must be a list of objects keyed by field.',
        })
        .min(1, 'Send at least one row.')
        .max(MAX_ROWS, `Send at most ${MAX_ROWS} rows per upload.`),
    ),
});
