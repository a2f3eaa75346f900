import { appContext } from '../../../../lib/server/app-context';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { respondToInvitation } from '../../../../lib/server/firms/invitation-service';
import { requireIdentity } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Declines an invitation addressed to the signed-in person. */
export const POST = handleApi(async (context) => {
  const identity = requireIdentity(context);
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  await respondToInvitation(firmDepsFrom(context, identity, { auth, db: database.db }), context.params.id ?? '', false);
  return json({ ok: true });
});
