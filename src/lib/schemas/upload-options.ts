import { z } from 'zod';
import { DELIMITERS } from '../import/delimiter';

/**
 * The choices that travel with an uploaded file (form field `options`, JSON): how to read it and the
 * corrections made in the browser. The file itself is the form field `file`.
 */
export const uploadOptionsSchema = z.strictObject({
  format: z.enum(['csv', 'ags4'], { error: 'format must be csv or ags4.' }).default('csv'),
  delimiter: z.enum(DELIMITERS, { error: 'delimiter must be a comma, a semicolon or a tab.' }).optional(),
  /** field key (or null: not imported) for each column, in file order */
  mapping: z.array(z.string().nullable(), { error: 'mapping must list a field (or null) for each column.' }).max(500).optional(),
  /** unit id per field key, e.g. { "depthTop": "ft" } */
  units: z.record(z.string(), z.string()).optional(),
  /** cell corrections: { rowNumber: { fieldKey: text as typed } } */
  edits: z.record(z.string(), z.record(z.string(), z.string())).optional(),
  /** AGS4: the region of every test in the file; CSV: the region when the file has no region column */
  region: z.string().trim().max(120).optional(),
  /** AGS4: geology code → geological unit name */
  geologyMap: z.record(z.string(), z.string()).optional(),
  /** remember this column mapping for the firm's next upload */
  remember: z.boolean().optional(),
});

export type UploadOptions = z.infer<typeof uploadOptionsSchema>;
