import { respondToInvitation } from '../../../../lib/server/firms/invitation-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { requireIdentity } from '../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Declines an invitation addressed to the signed-in person. */
export const POST = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  const { id } = readParams(context, { id: authIdParam });
  await readEmptyBody(context.request);
  await respondToInvitation(app, firmCallerOf(context, identity), id, false);
  return json({ ok: true });
});
