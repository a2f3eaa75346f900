import { revokeApiKey } from '../../../../lib/server/firms/api-key-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Revokes one of the active firm's API keys. */
export const DELETE = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  const { id } = readParams(context, { id: authIdParam });
  await readEmptyBody(context.request);
  await revokeApiKey(app, firmCallerOf(context, identity), activeFirmId(identity), id);
  return new Response(null, { status: 204 });
});
