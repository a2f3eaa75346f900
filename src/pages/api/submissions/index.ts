import { appContext } from '../../../lib/server/app-context';
import { listSubmissions } from '../../../lib/server/bank/submission-service';
import { config } from '../../../lib/server/config';
import { submitUpload } from '../../../lib/server/contribute/submit-upload';
import { readUploadRequest } from '../../../lib/server/contribute/upload-request';
import { activeFirmId, requireAnyPermission, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** Submissions: the active firm's own, or (for stewards) everything past draft. */
export const GET = handleApi(async (context) => {
  const identity = await requireAnyPermission(context, [
    ['submission', 'read'],
    ['submission', 'review'],
  ]);
  return json({ submissions: await listSubmissions(appContext().database.db, identity) });
});

/**
 * Uploads a file (multipart: `file`, and `options` as JSON — see the README) for the active firm.
 * Stored whole or not at all: 201 with the submission, or 422 with one issue per row and field.
 */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const upload = await readUploadRequest(context.request);
  const { database, outbox } = appContext();
  const contributor = {
    userId: identity.user.id,
    firmId: activeFirmId(identity),
    ipAddress: context.clientAddress,
    via: 'browser' as const,
  };
  const submission = await submitUpload(database.db, contributor, upload, upload.options.format, config.appUrl);
  outbox?.kick();
  return json({ submission }, 201);
});
