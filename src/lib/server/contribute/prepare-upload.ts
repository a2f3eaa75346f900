import type { Kysely } from 'kysely';
import {
  applyEdits,
  autoMapColumns,
  duplicateKey,
  IMPORT_FIELDS,
  type ImportError,
  MAX_FILE_BYTES,
  mapRows,
  parseCsv,
  type RawRow,
  type RememberedMapping,
  type RowError,
  readAgs4,
  type SharedViewEntry,
  sharedView,
  type ValidRow,
  validateRows,
} from '../../import';
import type { UploadOptions } from '../../schemas/upload-options';
import type { Database } from '../db/schema';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { RecordToStore } from './record-to-store';
import { toRecordToStore } from './to-record';

export interface PreparedColumns {
  headers: string[];
  mapping: (string | null)[];
  units: Record<string, string>;
  missingRequired: string[];
}

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

export async function loadVocabulary(db: Kysely<Database>) {
  const regions = await db.selectFrom('region').select(['id', 'name', 'slug']).execute();
  const units = await db.selectFrom('geological_unit').select(['id', 'name', 'slug']).execute();
  return { regions, units };
}

/** Duplicate keys of the firm's tests already in the bank (any status but rejected or withdrawn). */
async function existingKeys(db: Kysely<Database>, firmId: string): Promise<Set<string>> {
  const rows = await inTenantTransaction(db, { firmId, platformRole: 'user' }, (trx) =>
    trx
      .selectFrom('test_record as r')
      .innerJoin('test_record_private as p', 'p.test_record_id', 'r.id')
      .select(['p.borehole_id', 'p.sample_id', 'r.depth_top_m', 'r.depth_bottom_m'])
      .where('r.firm_id', '=', firmId)
      .where('r.status', 'not in', ['rejected', 'withdrawn'])
      .execute(),
  );
  return new Set(
    rows.map((row) =>
      duplicateKey({
        boreholeId: row.borehole_id ?? '',
        sampleId: row.sample_id,
        depthTop: row.depth_top_m,
        depthBottom: row.depth_bottom_m,
      }),
    ),
  );
}

export async function rememberedMapping(db: Kysely<Database>, firmId: string): Promise<RememberedMapping> {
  const row = await inTenantTransaction(db, { firmId, platformRole: 'user' }, (trx) =>
    trx
      .selectFrom('field_mapping')
      .select('mapping')
      .where('firm_id', '=', firmId)
      .where('name', '=', 'default')
      .executeTakeFirst(),
  );
  return (row?.mapping ?? {}) as RememberedMapping;
}

/** Reads the file into raw rows with the person's (or the remembered, or the automatic) column choices. */
async function readRows(db: Kysely<Database>, firmId: string, bytes: Uint8Array, options: UploadOptions) {
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
  const auto = options.mapping ? null : autoMapColumns(headers, await rememberedMapping(db, firmId));
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
  db: Kysely<Database>,
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
  const read = await readRows(db, firmId, bytes, options);
  if (!read.ok) return read;
  return prepareRawRows(db, firmId, read.rows, { notices: read.notices, columns: read.columns, geologyCodes: read.geologyCodes });
}

/** The checking half of prepareUpload, for rows that did not come from a file (JSON from a partner script). */
export async function prepareRawRows(
  db: Kysely<Database>,
  firmId: string,
  rows: RawRow[],
  context: { notices: string[]; columns: PreparedColumns | null; geologyCodes: string[] } = {
    notices: [],
    columns: null,
    geologyCodes: [],
  },
): Promise<PreparedUpload> {
  const vocabulary = await loadVocabulary(db);
  const { valid, errors } = validateRows(rows, { ...vocabulary, existingKeys: await existingKeys(db, firmId) });
  return { ok: true, rowCount: rows.length, valid, records: valid.map(toRecordToStore), errors, ...context };
}

/** "What others will see" for the first rows, for the person to check before submitting. */
export function previewOf(valid: readonly ValidRow[]): { row: number; shared: SharedViewEntry[] }[] {
  return valid.slice(0, PREVIEW_ROWS).map((row) => ({ row: row.row, shared: sharedView(row) }));
}
