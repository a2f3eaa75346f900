import { appContext } from '../../../lib/server/app-context';
import { listSubmissions } from '../../../lib/server/bank/submission-service';
import { requireAnyPermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** Submissions: the active firm's own, or (for stewards) everything past draft. */
export const GET = handleApi(async (context) => {
  const identity = await requireAnyPermission(context, [
    ['submission', 'read'],
    ['submission', 'review'],
  ]);
  return json({ submissions: await listSubmissions(appContext().database.db, identity) });
});
