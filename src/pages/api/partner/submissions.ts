import type { DELIMITERS } from '../../../lib/import';
import { partnerJsonUploadSchema } from '../../../lib/schemas/partner-upload';
import { authenticateFirmKey } from '../../../lib/server/auth/firm-key';
import { submitUpload } from '../../../lib/server/contribute/submit-upload';
import { sha256Of } from '../../../lib/server/contribute/upload-request';
import { keyContributorOf } from '../../../lib/server/http/acting';
import { ApiError } from '../../../lib/server/http/api-error';
import { BODY_LIMIT_BYTES, readBodyBytes, requireStorableText } from '../../../lib/server/http/read-body';
import { handleApi, json, parseJsonBody } from '../../../lib/server/http/respond';
import { MAX_UPLOAD_BYTES } from '../../../lib/server/http/upload-reader';

export const prerender = false;

const DELIMITER_NAMES: Record<string, (typeof DELIMITERS)[number]> = { comma: ',', semicolon: ';', tab: '\t' };

function delimiterFrom(url: URL) {
  const name = url.searchParams.get('delimiter');
  if (!name) return undefined;
  const delimiter = DELIMITER_NAMES[name];
  if (!delimiter) {
    throw new ApiError('VALIDATION_FAILED', 'delimiter must be comma, semicolon or tab.', [
      { path: 'delimiter', message: 'Use comma, semicolon or tab.' },
    ]);
  }
  return delimiter;
}

/**
 * A partner firm's script submits test records with its firm API key (x-api-key): a CSV body
 * (`Content-Type: text/csv`, headers as in the template; `?delimiter=comma|semicolon|tab`) or JSON
 * (`{ "rows": [{ "boreholeId": "…", "depthTop": 4.5, … }] }`). The firm is the key's own. Answers
 * 201 with the submission, or 422 with one issue per row and field; nothing is stored then.
 */
export const POST = handleApi(async (context, app) => {
  const caller = await authenticateFirmKey(app.auth, context.request.headers);
  const type = (context.request.headers.get('content-type') ?? '').toLowerCase();
  const isJson = type.includes('application/json');
  if (!isJson && !type.includes('text/csv')) {
    throw new ApiError(
      'UNSUPPORTED_MEDIA_TYPE',
      'Send Content-Type: text/csv (a CSV file as the body) or application/json ({ "rows": [...] }).',
    );
  }
  const bytes = await readBodyBytes(context.request, isJson ? BODY_LIMIT_BYTES.partnerRows : MAX_UPLOAD_BYTES);
  const body = isJson ? parseJsonBody(bytes, partnerJsonUploadSchema) : null;
  const delimiter = delimiterFrom(context.url);
  const fileName =
    body?.fileName ??
    requireStorableText(context.url.searchParams.get('fileName'), 'fileName') ??
    (body ? 'api-upload.json' : 'api-upload.csv');
  const upload = {
    bytes,
    fileName,
    mediaType: body ? 'application/json' : 'text/csv',
    sha256: sha256Of(bytes),
    options: {
      format: 'csv' as const,
      delimiter,
      region: requireStorableText(context.url.searchParams.get('region') ?? undefined, 'region'),
    },
  };
  const rawRows = body?.rows.map((values, index) => ({ row: index + 1, values }));
  const submission = await submitUpload(app, keyContributorOf(context, caller), upload, 'api', rawRows);
  app.kickOutbox();
  return json({ submission }, 201);
});
