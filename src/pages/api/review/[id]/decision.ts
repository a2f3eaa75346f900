import { reviewDecisionSchema } from '../../../../lib/contracts/review';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { BODY_LIMIT_BYTES } from '../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { decideSubmission } from '../../../../lib/server/review/review-decision';

export const prerender = false;

/** Accept, return (with comments) or reject a submission (data stewards). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'review');
  const { id } = readParams(context, { id: uuidParam });
  const decision = await readJsonBody(context.request, reviewDecisionSchema, BODY_LIMIT_BYTES.reviewDecision);
  const result = await decideSubmission(app, actingPerson(context, identity), id, decision);
  app.kickOutbox();
  return json(result);
});
