import { appContext } from '../../../../lib/server/app-context';
import { revokeApiKey } from '../../../../lib/server/firms/api-key-service';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Revokes one of the active firm's API keys. */
export const DELETE = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  await revokeApiKey(firmDepsFrom(context, identity, { auth, db: database.db }), activeFirmId(identity), context.params.id ?? '');
  return new Response(null, { status: 204 });
});
