import type { DELIMITERS, RawRow } from '../../../lib/import';
import { partnerJsonUploadSchema } from '../../../lib/schemas/partner-upload';
import { appContext } from '../../../lib/server/app-context';
import { authenticateFirmKey } from '../../../lib/server/auth/firm-key';
import { config } from '../../../lib/server/config';
import { submitUpload } from '../../../lib/server/contribute/submit-upload';
import { MAX_UPLOAD_BYTES, sha256Of } from '../../../lib/server/contribute/upload-request';
import { ApiError } from '../../../lib/server/http/api-error';
import { BODY_LIMIT_BYTES, parseJsonBytes, readBodyBytes, requireStorableText } from '../../../lib/server/http/read-body';
import { handleApi, issuesFromZod, json } from '../../../lib/server/http/respond';

export const prerender = false;

const DELIMITER_NAMES: Record<string, (typeof DELIMITERS)[number]> = { comma: ',', semicolon: ';', tab: '\t' };

/**
 * A partner firm's script submits test records with its firm API key (x-api-key): a CSV body
 * (`Content-Type: text/csv`, headers as in the template; `?delimiter=comma|semicolon|tab`) or JSON
 * (`{ "rows": [{ "boreholeId": "…", "depthTop": 4.5, … }] }`). The firm is the key's own. Answers
 * 201 with the submission, or 422 with one issue per row and field; nothing is stored then.
 */
export const POST = handleApi(async (context) => {
  const { auth, database, outbox } = appContext();
  const caller = await authenticateFirmKey(auth, context.request.headers);
  const type = (context.request.headers.get('content-type') ?? '').toLowerCase();
  const isJson = type.includes('application/json');
  if (!isJson && !type.includes('text/csv')) {
    throw new ApiError(
      'UNSUPPORTED_MEDIA_TYPE',
      'Send Content-Type: text/csv (a CSV file as the body) or application/json ({ "rows": [...] }).',
    );
  }
  const bytes = await readBodyBytes(context.request, isJson ? BODY_LIMIT_BYTES.partnerRows : MAX_UPLOAD_BYTES);
  const contributor = {
    userId: null,
    firmId: caller.firmId,
    ipAddress: context.clientAddress,
    via: 'api' as const,
    apiKeyId: caller.keyId,
  };
  let rawRows: RawRow[] | undefined;
  let fileName = requireStorableText(context.url.searchParams.get('fileName'), 'fileName');
  if (isJson) {
    const parsed = partnerJsonUploadSchema.safeParse(parseJsonBytes(bytes));
    if (!parsed.success)
      throw new ApiError('VALIDATION_FAILED', 'The JSON upload does not fit; see issues.', issuesFromZod(parsed.error));
    rawRows = parsed.data.rows.map((values, index) => ({ row: index + 1, values }));
    fileName = parsed.data.fileName ?? fileName;
  }
  const delimiterName = context.url.searchParams.get('delimiter');
  const delimiter = delimiterName ? DELIMITER_NAMES[delimiterName] : undefined;
  if (delimiterName && !delimiter)
    throw new ApiError('VALIDATION_FAILED', 'delimiter must be comma, semicolon or tab.', [
      { path: 'delimiter', message: 'Use comma, semicolon or tab.' },
    ]);
  const upload = {
    bytes,
    fileName: fileName ?? (rawRows ? 'api-upload.json' : 'api-upload.csv'),
    mediaType: rawRows ? 'application/json' : 'text/csv',
    sha256: sha256Of(bytes),
    options: {
      format: 'csv' as const,
      delimiter,
      region: requireStorableText(context.url.searchParams.get('region') ?? undefined, 'region'),
    },
  };
  const submission = await submitUpload(database.db, contributor, upload, 'api', config.appUrl, rawRows);
  outbox?.kick();
  return json({ submission }, 201);
});
