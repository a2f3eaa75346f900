import { EngineInputError, previewEstimate } from '../../../lib/consolidation';
import { estimatePreviewSchema } from '../../../lib/schemas/estimate-preview';
import { ApiError } from '../../../lib/server/http/api-error';
import { requirePermission } from '../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * Settlement and time-rate preview of a layered profile (see the README's API section). Nothing is
 * saved. 400 with per-field issues when the body does not fit the schema; 422 when it fits but is
 * physically impossible.
 */
export const POST = handleApi(async (context) => {
  await requirePermission(context, 'estimate', 'create');
  const input = await readJsonBody(context.request, estimatePreviewSchema, BODY_LIMIT_BYTES.estimate);
  try {
    return json(previewEstimate(input));
  } catch (error) {
    if (error instanceof EngineInputError) {
      throw new ApiError('UNPROCESSABLE', `The profile cannot be computed: ${error.message}`, [
        { path: error.fieldPath, message: error.message },
      ]);
    }
    throw error;
  }
});
