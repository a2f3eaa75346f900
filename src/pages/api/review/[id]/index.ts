import { requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { handleApi, json } from '../../../../lib/server/http/respond';
import { reviewDetail } from '../../../../lib/server/review/review-detail';

export const prerender = false;

/** A submission for review: shared values, comparison with the deposit, flags, raw readings, history. */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'submission', 'review');
  const { id } = readParams(context, { id: uuidParam });
  return json(await reviewDetail(app, id));
});
