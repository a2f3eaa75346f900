import { pageQuerySchema } from '../../../lib/schemas/paging';
import { appContext } from '../../../lib/server/app-context';
import { listRecords } from '../../../lib/server/bank/record-service';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json, readQuery } from '../../../lib/server/http/respond';

export const prerender = false;

/** Published test records and the caller's firm's own, anonymised; ?limit=&offset= (max 200). */
export const GET = handleApi(async (context) => {
  const identity = await requirePermission(context, 'bank', 'browse');
  const page = readQuery(context.url, pageQuerySchema);
  return json(await listRecords(appContext().database.db, identity, page));
});
