import { suspendPersonSchema } from '../../../../../lib/contracts/people';
import { firmCallerOf } from '../../../../../lib/server/http/acting';
import { requirePermission } from '../../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../../lib/server/http/params';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';
import { setSuspension } from '../../../../../lib/server/people/people-service';

export const prerender = false;

/** Suspends a person (sessions end, sign-in refused) or lifts it: `{ suspended: true, reason }` / `{ suspended: false }`. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'people', 'manage');
  const { id } = readParams(context, { id: authIdParam });
  const body = await readJsonBody(context.request, suspendPersonSchema);
  return json(await setSuspension(app, firmCallerOf(context, identity), id, body));
});
