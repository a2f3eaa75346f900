import { leaveFirm } from '../../../lib/server/firms/firm-service';
import { firmCallerOf } from '../../../lib/server/http/acting';
import { activeFirmId, requireIdentity } from '../../../lib/server/http/guards';
import { readEmptyBody } from '../../../lib/server/http/read-body';
import { handleApi } from '../../../lib/server/http/respond';

export const prerender = false;

/** Leaves the active firm. */
export const POST = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  await readEmptyBody(context.request);
  await leaveFirm(app, firmCallerOf(context, identity), activeFirmId(identity));
  return new Response(null, { status: 204 });
});
