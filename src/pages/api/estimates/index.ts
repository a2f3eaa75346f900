import { saveEstimateSchema } from '../../../lib/contracts/estimates';
import { listEstimates, saveEstimate } from '../../../lib/server/estimates/estimate-service';
import { actingPerson } from '../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** The active firm's saved estimates. */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'estimate', 'read');
  return json(await listEstimates(app, activeFirmId(identity)));
});

/** Saves an estimate for the active firm. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'estimate', 'create');
  const body = await readJsonBody(context.request, saveEstimateSchema, BODY_LIMIT_BYTES.estimate);
  const person = { ...actingPerson(context, identity), firmId: activeFirmId(identity) };
  return json(await saveEstimate(app, person, body), 201);
});
