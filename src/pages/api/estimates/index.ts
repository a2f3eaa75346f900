import { saveEstimateSchema } from '../../../lib/schemas/estimate';
import { appContext } from '../../../lib/server/app-context';
import { listEstimates, saveEstimate } from '../../../lib/server/bank/estimate-service';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** The active firm's saved estimates. */
export const GET = handleApi(async (context) => {
  const identity = await requirePermission(context, 'estimate', 'read');
  return json({ estimates: await listEstimates(appContext().database.db, identity, activeFirmId(identity)) });
});

/** Saves an estimate for the active firm. */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'estimate', 'create');
  const body = await readJsonBody(context.request, saveEstimateSchema, BODY_LIMIT_BYTES.estimate);
  const estimate = await saveEstimate(appContext().database.db, identity, activeFirmId(identity), body, context.clientAddress);
  return json({ estimate }, 201);
});
