import { reviewDecisionSchema } from '../../../../lib/schemas/review';
import { appContext } from '../../../../lib/server/app-context';
import { config } from '../../../../lib/server/config';
import { requirePermission } from '../../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { decideSubmission } from '../../../../lib/server/review/review-decision';

export const prerender = false;

/** Accept, return (with comments) or reject a submission (data stewards). */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'review');
  const decision = await readJsonBody(context.request, reviewDecisionSchema, BODY_LIMIT_BYTES.reviewDecision);
  const { database, outbox } = appContext();
  const result = await decideSubmission(
    database.db,
    { userId: identity.user.id, ipAddress: context.clientAddress },
    context.params.id ?? '',
    decision,
    config.appUrl,
  );
  outbox?.kick();
  return json({ submission: result });
});
