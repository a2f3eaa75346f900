import type { DELIMITERS, RawRow } from '../../../lib/import';
import { partnerJsonUploadSchema } from '../../../lib/schemas/partner-upload';
import { appContext } from '../../../lib/server/app-context';
import { authenticateFirmKey } from '../../../lib/server/auth/firm-key';
import { config } from '../../../lib/server/config';
import { submitUpload } from '../../../lib/server/contribute/submit-upload';
import { refuseOversizedBody, sha256Of } from '../../../lib/server/contribute/upload-request';
import { ApiError } from '../../../lib/server/http/api-error';
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
  refuseOversizedBody(context.request);
  const type = (context.request.headers.get('content-type') ?? '').toLowerCase();
  const bytes = new Uint8Array(await context.request.arrayBuffer());
  const contributor = {
    userId: null,
    firmId: caller.firmId,
    ipAddress: context.clientAddress,
    via: 'api' as const,
    apiKeyId: caller.keyId,
  };
  let rawRows: RawRow[] | undefined;
  let fileName = context.url.searchParams.get('fileName');
  if (type.includes('application/json')) {
    let body: unknown;
    try {
      body = JSON.parse(new TextDecoder().decode(bytes));
    } catch {
      throw new ApiError('BAD_REQUEST', 'The body is not valid JSON.');
    }
    const parsed = partnerJsonUploadSchema.safeParse(body);
    if (!parsed.success)
      throw new ApiError('VALIDATION_FAILED', 'The JSON upload does not fit; see issues.', issuesFromZod(parsed.error));
    rawRows = parsed.data.rows.map((values, index) => ({ row: index + 1, values }));
    fileName = parsed.data.fileName ?? fileName;
  } else if (!type.includes('text/csv')) {
    throw new ApiError(
      'UNSUPPORTED_MEDIA_TYPE',
      'Send Content-Type: text/csv (a CSV file as the body) or application/json ({ "rows": [...] }).',
    );
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
    options: { format: 'csv' as const, delimiter, region: context.url.searchParams.get('region') ?? undefined },
  };
  const submission = await submitUpload(database.db, contributor, upload, 'api', config.appUrl, rawRows);
  outbox?.kick();
  return json({ submission }, 201);
});
