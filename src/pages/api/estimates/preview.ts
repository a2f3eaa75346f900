import { previewEstimate } from '../../../lib/consolidation';
import { estimatePreviewSchema } from '../../../lib/contracts/estimates';
import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * Settlement and time-rate preview of a layered profile (see the README's API section). Nothing is
 * saved. 400 with per-field issues when the body does not fit the schema; 422 when it fits but is
 * physically impossible (the engine's EngineInputError, mapped in error-mapper.ts).
 */
export const POST = handleApi(async (context) => {
  await requirePermission(context, 'estimate', 'create');
  const input = await readJsonBody(context.request, estimatePreviewSchema);
  return json(previewEstimate(input));
});
