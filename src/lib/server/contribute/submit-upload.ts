import type { Kysely } from 'kysely';
import { mappingToRemember, type RawRow } from '../../import';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { type PreparedUpload, prepareRawRows, prepareUpload, previewOf } from './prepare-upload';
import { type Contributor, storeSubmission } from './store-submission';
import { importFailure, type UploadRequest } from './upload-request';

const MAX_ISSUES = 500;

/** A dry run: what the upload would store, every row problem, and the shared view of the first rows. */
export async function checkUpload(db: Kysely<Database>, firmId: string, upload: UploadRequest) {
  const prepared = await prepareUpload(db, firmId, upload.bytes, upload.options);
  if (!prepared.ok) throw importFailure(prepared.error);
  return {
    rowCount: prepared.rowCount,
    validCount: prepared.valid.length,
    errors: prepared.errors,
    notices: prepared.notices,
    columns: prepared.columns,
    geologyCodes: prepared.geologyCodes,
    flags: prepared.records.flatMap((r) => r.flags.map((flag) => ({ row: r.rowNumber, ...flag }))),
    preview: previewOf(prepared.valid),
  };
}

function rowIssues(prepared: Extract<PreparedUpload, { ok: true }>) {
  return prepared.errors
    .slice(0, MAX_ISSUES)
    .map((e) => ({ path: `rows.${e.row}${e.field ? `.${e.field}` : ''}`, message: e.message }));
}

async function rememberMapping(db: Kysely<Database>, firmId: string, prepared: Extract<PreparedUpload, { ok: true }>) {
  if (!prepared.columns) return;
  const mapping = JSON.stringify(mappingToRemember(prepared.columns.headers, prepared.columns.mapping, prepared.columns.units));
  await inTenantTransaction(db, { firmId, platformRole: 'user' }, (trx) =>
    trx
      .insertInto('field_mapping')
      .values({ firm_id: firmId, name: 'default', mapping })
      .onConflict((oc) => oc.columns(['firm_id', 'name']).doUpdateSet({ mapping, updated_at: new Date() }))
      .execute(),
  );
}

/**
 * Checks and stores an upload. Any row problem refuses the whole upload (422, one issue per row and
 * field) and stores nothing; a clean upload is stored whole by storeSubmission.
 */
export async function submitUpload(
  db: Kysely<Database>,
  contributor: Contributor,
  upload: UploadRequest,
  kind: 'csv' | 'ags4' | 'api' | 'seed',
  appUrl: string,
  rawRows?: RawRow[],
) {
  const prepared = rawRows
    ? await prepareRawRows(db, contributor.firmId, rawRows)
    : await prepareUpload(db, contributor.firmId, upload.bytes, upload.options);
  if (!prepared.ok) throw importFailure(prepared.error);
  if (prepared.errors.length > 0) {
    const rows = new Set(prepared.errors.map((e) => e.row)).size;
    throw new ApiError(
      'UNPROCESSABLE',
      `${rows} of ${prepared.rowCount} rows need correcting (${prepared.errors.length} problem${prepared.errors.length === 1 ? '' : 's'}); nothing was stored. Fix them and submit again.`,
      rowIssues(prepared),
    );
  }
  if (prepared.columns && prepared.columns.missingRequired.length > 0 && !upload.options.mapping) {
    throw new ApiError(
      'UNPROCESSABLE',
      `No column was matched for: ${prepared.columns.missingRequired.join(', ')}. Rename the headers as in the template or send a mapping.`,
    );
  }
  const stored = await storeSubmission(
    db,
    contributor,
    { kind, name: upload.fileName, mediaType: upload.mediaType, bytes: upload.bytes, sha256: upload.sha256 },
    prepared.records,
    appUrl,
  );
  if (upload.options.remember) await rememberMapping(db, contributor.firmId, prepared);
  return stored;
}
