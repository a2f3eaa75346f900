import { pageQuerySchema } from '../../../lib/schemas/paging';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../../lib/server/http/respond';
import { bankVersions } from '../../../lib/server/versions/version-service';

export const prerender = false;

/** The bank's published versions, newest first (`?limit=&offset=`; stewards, platform admin). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'bank', 'versions');
  return json(await bankVersions(app, readQuery(context.url, pageQuerySchema)));
});
