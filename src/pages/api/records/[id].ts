import { appContext } from '../../../lib/server/app-context';
import { getRecord } from '../../../lib/server/bank/record-service';
import { requireAnyPermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** One test record; private details only for the owning firm; 404 when the caller may not see it. */
export const GET = handleApi(async (context) => {
  const identity = await requireAnyPermission(context, [
    ['bank', 'browse'],
    ['submission', 'read'],
    ['submission', 'review'],
  ]);
  return json(await getRecord(appContext().database.db, identity, context.params.id ?? ''));
});
