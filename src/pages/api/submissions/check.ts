import { appContext } from '../../../lib/server/app-context';
import { checkUpload } from '../../../lib/server/contribute/submit-upload';
import { readUploadRequest } from '../../../lib/server/contribute/upload-request';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** A dry run of an upload: row problems, flags and what others will see. Stores nothing. */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const upload = await readUploadRequest(context.request);
  return json(await checkUpload(appContext().database.db, activeFirmId(identity), upload));
});
