import { requireAnyPermission } from '../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../lib/server/http/params';
import { handleApi, json } from '../../../lib/server/http/respond';
import { getRecord } from '../../../lib/server/records/record-service';

export const prerender = false;

/** One test record; private details only for the owning firm; 404 when the caller may not see it. */
export const GET = handleApi(async (context, app) => {
  const identity = await requireAnyPermission(context, [
    ['bank', 'browse'],
    ['submission', 'read'],
    ['submission', 'review'],
  ]);
  const { id } = readParams(context, { id: uuidParam });
  return json(await getRecord(app, identity, id));
});
