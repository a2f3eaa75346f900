import { directoryQuerySchema } from '../../../../lib/contracts/people';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../../../lib/server/http/respond';
import { listPeople } from '../../../../lib/server/people/people-service';

export const prerender = false;

/** People, searched by name or e-mail (`?q=&limit=&offset=`), with their firms (platform admin). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'people', 'manage');
  return json(await listPeople(app, readQuery(context.url, directoryQuerySchema)));
});
