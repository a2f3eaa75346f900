import { createApiKeySchema } from '../../../../lib/contracts/firms';
import { createApiKey, listApiKeys } from '../../../../lib/server/firms/api-key-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** The active firm's API keys (owner or admin only). */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  return json(await listApiKeys(app, firmCallerOf(context, identity), activeFirmId(identity)));
});

/** Creates a key for the firm's upload scripts; the secret is in this answer only. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-api-keys');
  const body = await readJsonBody(context.request, createApiKeySchema);
  return json(await createApiKey(app, firmCallerOf(context, identity), activeFirmId(identity), body.name), 201);
});
