import { createApiKeySchema } from '../../../../lib/schemas/firm';
import { appContext } from '../../../../lib/server/app-context';
import { createApiKey, listApiKeys } from '../../../../lib/server/firms/api-key-service';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** The active firm's API keys (owner or admin only). */
export const GET = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  const { auth, database } = appContext();
  return json({ keys: await listApiKeys(firmDepsFrom(context, identity, { auth, db: database.db }), activeFirmId(identity)) });
});

/** Creates a key for the firm's upload scripts; the secret is in this answer only. */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  const body = await readJsonBody(context.request, createApiKeySchema);
  const { auth, database } = appContext();
  return json(
    await createApiKey(firmDepsFrom(context, identity, { auth, db: database.db }), activeFirmId(identity), body.name),
    201,
  );
});
