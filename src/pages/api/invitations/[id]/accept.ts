import { respondToInvitation } from '../../../../lib/server/firms/invitation-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { requireIdentity } from '../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Accepts an invitation addressed to the signed-in person; the firm becomes active. */
export const POST = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  const { id } = readParams(context, { id: authIdParam });
  await readEmptyBody(context.request);
  return json(await respondToInvitation(app, firmCallerOf(context, identity), id, true));
});
