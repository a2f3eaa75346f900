import type { CheckColumns } from '../../contracts/submissions';
import {
  applyEdits,
  autoMapColumns,
  IMPORT_FIELDS,
  type ImportError,
  MAX_FILE_BYTES,
  mapRows,
  parseCsv,
  type RawRow,
  type RowError,
  readAgs4,
  type SharedViewEntry,
  sharedView,
  type ValidRow,
  validateRows,
} from '../../import';
import type { UploadOptions } from '../../schemas/upload-options';
import type { AppServices } from '../app-services';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { importVocabulary } from '../vocabulary/vocabulary-service';
import { rememberedMapping } from './field-mapping';
import { firmRecordKeys } from './firm-record-keys';
import type { RecordToStore } from './record-to-store';
import { toRecordToStore } from './to-record';

/** The column choices an upload was read with (the check answer shows them). */
export type PreparedColumns = CheckColumns;

export type PreparedUpload =
  | { ok: false; error: ImportError }
  | {
      ok: true;
      rowCount: number;
      valid: ValidRow[];
      records: RecordToStore[];
      errors: RowError[];
      notices: string[];
      columns: PreparedColumns | null;
      geologyCodes: string[];
    };

const PREVIEW_ROWS = 25;

/** Reads the file into raw rows with the person's (or the remembered, or the automatic) column choices. */
async function readRows(app: Pick<AppServices, 'db'>, firmId: string, bytes: Uint8Array, options: UploadOptions) {
  if (options.format === 'ags4') {
    const read = readAgs4(bytes, { region: options.region ?? '', geologyMap: options.geologyMap });
    if (!read.ok) return read;
    return {
      ok: true as const,
      rows: applyEdits(read.rows, options.edits ?? {}),
      notices: read.notices,
      columns: null,
      geologyCodes: read.geologyCodes,
    };
  }
  const parsed = parseCsv(bytes, { delimiter: options.delimiter });
  if (!parsed.ok) return parsed;
  const headers = parsed.table.headers;
  const auto = options.mapping ? null : autoMapColumns(headers, await rememberedMapping(app, firmId));
  const mapping = options.mapping ?? auto?.mapping ?? [];
  const units = (options.units ?? auto?.units ?? {}) as Record<string, string>;
  const defaults = options.region ? { region: options.region } : undefined;
  const mapped = mapRows(parsed.table, mapping, units, options.edits ?? {}, { defaults });
  if (!mapped.ok) return mapped;
  const chosen = new Set(mapping.filter((field): field is string => field !== null));
  const missingRequired =
    auto?.missingRequired ??
    IMPORT_FIELDS.filter((f) => f.required && !chosen.has(f.key) && !(f.key === 'region' && options.region)).map((f) => f.key);
  return {
    ok: true as const,
    rows: mapped.rows as RawRow[],
    notices: [] as string[],
    columns: { headers, mapping: [...mapping], units, missingRequired },
    geologyCodes: [] as string[],
  };
}

/**
 * Everything the server does to an upload before storing it: read the file (CSV or AGS4), apply the
 * column choices and cell corrections, check every row against the vocabulary and the firm's earlier
 * uploads, and split each valid row into its shared and private parts. Stores nothing.
 */
export async function prepareUpload(
  app: Pick<AppServices, 'db'>,
  firmId: string,
  bytes: Uint8Array,
  options: UploadOptions,
): Promise<PreparedUpload> {
  if (bytes.byteLength > MAX_FILE_BYTES) {
    return {
      ok: false,
      error: {
        code: 'TOO_LARGE',
        message: `The file is larger than ${MAX_FILE_BYTES / 1024 / 1024} MB. Split it into smaller files.`,
      },
    };
  }
  const read = await readRows(app, firmId, bytes, options);
  if (!read.ok) return read;
  return prepareRawRows(app, firmId, read.rows, {
    notices: read.notices,
    columns: read.columns,
    geologyCodes: read.geologyCodes,
  });
}

/** The checking half of prepareUpload, for rows that did not come from a file (JSON from a partner script). */
export async function prepareRawRows(
  app: Pick<AppServices, 'db'>,
  firmId: string,
  rows: RawRow[],
  context: { notices: string[]; columns: PreparedColumns | null; geologyCodes: string[] } = {
    notices: [],
    columns: null,
    geologyCodes: [],
  },
): Promise<PreparedUpload> {
  const vocabulary = await importVocabulary(app);
  const existingKeys = await inTenantTransaction(app.db, firmScope(firmId), (trx) => firmRecordKeys(trx, firmId));
  const { valid, errors } = validateRows(rows, { ...vocabulary, existingKeys });
  return { ok: true, rowCount: rows.length, valid, records: valid.map(toRecordToStore), errors, ...context };
}

/** "What others will see" for the first rows, for the person to check before submitting. */
export function previewOf(valid: readonly ValidRow[]): { row: number; shared: SharedViewEntry[] }[] {
  return valid.slice(0, PREVIEW_ROWS).map((row) => ({ row: row.row, shared: sharedView(row) }));
}
