import { submitUpload } from '../../../lib/server/contribute/submit-upload';
import { contributorOf } from '../../../lib/server/http/acting';
import { requireAnyPermission, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';
import { readUploadRequest } from '../../../lib/server/http/upload-reader';
import { listSubmissions } from '../../../lib/server/submissions/submission-service';

export const prerender = false;

/** Submissions: the active firm's own, or (for stewards) everything past draft. */
export const GET = handleApi(async (context, app) => {
  const identity = await requireAnyPermission(context, [
    ['submission', 'read'],
    ['submission', 'review'],
  ]);
  return json(await listSubmissions(app, identity));
});

/**
 * Uploads a file (multipart: `file`, and `options` as JSON — see the README) for the active firm.
 * Stored whole or not at all: 201 with the submission, 409 for a file already uploaded, or 422 with
 * one issue per row and field.
 */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const contributor = contributorOf(context, identity);
  const upload = await readUploadRequest(context.request);
  const submission = await submitUpload(app, contributor, upload, upload.options.format);
  app.kickOutbox();
  return json({ submission }, 201);
});
