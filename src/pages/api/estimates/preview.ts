import { estimatePreviewSchema } from '../../../lib/contracts/estimates';
import { previewInWorker } from '../../../lib/server/estimates/preview-service';
import { requirePermission } from '../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../lib/server/http/read-body';
import { handleApi, jsonText, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * Settlement and time-rate preview of a layered profile (see the README's API section). Nothing is
 * saved. 400 with per-field issues when the body does not fit the schema; 422 when it fits but is
 * physically impossible; 503 with Retry-After when the preview workers' queue is full. The engine
 * runs in a worker thread, never on the event loop.
 */
export const POST = handleApi(async (context) => {
  await requirePermission(context, 'estimate', 'create');
  const input = await readJsonBody(context.request, estimatePreviewSchema, BODY_LIMIT_BYTES.estimate);
  return jsonText(await previewInWorker(input, context.request.signal));
});
