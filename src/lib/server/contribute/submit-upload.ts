import type { CheckResult, StoredSubmission } from '../../contracts/submissions';
import type { RawRow } from '../../import';
import type { AppServices } from '../app-services';
import { ImportFileError, UnprocessableError } from '../errors';
import { firmScope } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import type { Contributor } from './contributor';
import { rememberMapping } from './field-mapping';
import { type PreparedUpload, prepareRawRows, prepareUpload, previewOf } from './prepare-upload';
import { refuseSameFile, storeSubmission } from './store-submission';
import type { UploadRequest } from './upload-request';

const MAX_ISSUES = 500;

type Prepared = Extract<PreparedUpload, { ok: true }>;

/** A dry run: what the upload would store, every row problem, and the shared view of the first rows. */
export async function checkUpload(app: Pick<AppServices, 'db'>, firmId: string, upload: UploadRequest): Promise<CheckResult> {
  const prepared = await prepareUpload(app, firmId, upload.bytes, upload.options);
  if (!prepared.ok) throw new ImportFileError(prepared.error);
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

/** 422 with one issue per row and field (the first 500) when any row needs correcting. */
function refuseRowProblems(prepared: Prepared): void {
  if (prepared.errors.length === 0) return;
  const rows = new Set(prepared.errors.map((e) => e.row)).size;
  const problems = `${prepared.errors.length} problem${prepared.errors.length === 1 ? '' : 's'}`;
  throw new UnprocessableError(
    `${rows} of ${prepared.rowCount} rows need correcting (${problems}); nothing was stored. Fix them and submit again.`,
    prepared.errors
      .slice(0, MAX_ISSUES)
      .map((e) => ({ path: `rows.${e.row}${e.field ? `.${e.field}` : ''}`, message: e.message })),
  );
}

/** 422 when required fields have no column and the person sent no mapping of their own. */
function refuseMissingColumns(prepared: Prepared, upload: UploadRequest): void {
  const missing = prepared.columns?.missingRequired ?? [];
  if (missing.length === 0 || upload.options.mapping) return;
  throw new UnprocessableError(
    `No column was matched for: ${missing.join(', ')}. Rename the headers as in the template or send a mapping.`,
  );
}

/**
 * Checks and stores an upload. The same file again is refused first (409); any row problem refuses
 * the whole upload (422, one issue per row and field) and stores nothing; a clean upload is stored
 * whole by storeSubmission. `rawRows` are rows that did not come from a file (a partner's JSON).
 */
export async function submitUpload(
  app: Pick<AppServices, 'db' | 'appUrl'>,
  contributor: Contributor,
  upload: UploadRequest,
  kind: 'csv' | 'ags4' | 'api' | 'seed',
  rawRows?: RawRow[],
): Promise<StoredSubmission> {
  const { firmId } = contributor;
  await inTenantTransaction(app.db, firmScope(firmId), (trx) => refuseSameFile(trx, firmId, upload.sha256));
  const prepared = rawRows
    ? await prepareRawRows(app, firmId, rawRows)
    : await prepareUpload(app, firmId, upload.bytes, upload.options);
  if (!prepared.ok) throw new ImportFileError(prepared.error);
  refuseRowProblems(prepared);
  refuseMissingColumns(prepared, upload);
  const source = { kind, name: upload.fileName, mediaType: upload.mediaType, bytes: upload.bytes, sha256: upload.sha256 };
  const stored = await storeSubmission(app, contributor, source, prepared.records);
  if (upload.options.remember && prepared.columns) await rememberMapping(app, firmId, prepared.columns);
  return stored;
}
