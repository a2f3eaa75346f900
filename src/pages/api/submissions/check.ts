import { checkUpload } from '../../../lib/server/contribute/submit-upload';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';
import { readUploadRequest } from '../../../lib/server/http/upload-reader';

export const prerender = false;

/** A dry run of an upload: row problems, flags and what others will see. Stores nothing. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const upload = await readUploadRequest(context.request);
  return json(await checkUpload(app, activeFirmId(identity), upload));
});
