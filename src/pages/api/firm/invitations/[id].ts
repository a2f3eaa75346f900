import { cancelInvitation } from '../../../../lib/server/firms/invitation-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Cancels a pending invitation of the caller's active firm. */
export const DELETE = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const { id } = readParams(context, { id: authIdParam });
  await readEmptyBody(context.request);
  await cancelInvitation(app, firmCallerOf(context, identity), activeFirmId(identity), id);
  return new Response(null, { status: 204 });
});
