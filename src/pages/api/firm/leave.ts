import { appContext } from '../../../lib/server/app-context';
import { firmDepsFrom, leaveFirm } from '../../../lib/server/firms/firm-service';
import { activeFirmId, requireIdentity } from '../../../lib/server/http/guards';
import { readEmptyBody } from '../../../lib/server/http/read-body';
import { handleApi } from '../../../lib/server/http/respond';

export const prerender = false;

/** Leaves the active firm. */
export const POST = handleApi(async (context) => {
  const identity = requireIdentity(context);
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  await leaveFirm(firmDepsFrom(context, identity, { auth, db: database.db }), activeFirmId(identity));
  return new Response(null, { status: 204 });
});
