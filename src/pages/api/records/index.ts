import { pageQuerySchema } from '../../../lib/schemas/paging';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../../lib/server/http/respond';
import { listRecords } from '../../../lib/server/records/record-service';

export const prerender = false;

/** Published test records and the caller's firm's own, anonymised; ?limit=&offset= (max 200). */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'bank', 'browse');
  const page = readQuery(context.url, pageQuerySchema);
  return json(await listRecords(app, identity, page));
});
