import { requirePermission } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';
import { reviewQueue } from '../../../lib/server/review/review-queue';

export const prerender = false;

/** Submissions waiting for review, oldest first (data stewards). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'submission', 'review');
  return json(await reviewQueue(app));
});
