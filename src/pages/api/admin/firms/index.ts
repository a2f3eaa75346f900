import { directoryQuerySchema } from '../../../../lib/contracts/people';
import { listFirms } from '../../../../lib/server/firms/ownership-service';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Firms, searched by name (`?q=&limit=&offset=`), with their members and roles (platform admin). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'people', 'manage');
  return json(await listFirms(app, readQuery(context.url, directoryQuerySchema)));
});
