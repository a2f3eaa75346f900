import { appContext } from '../../../../lib/server/app-context';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json } from '../../../../lib/server/http/respond';
import { reviewDetail } from '../../../../lib/server/review/review-detail';

export const prerender = false;

/** A submission for review: shared values, comparison with the deposit, flags, raw readings, history. */
export const GET = handleApi(async (context) => {
  await requirePermission(context, 'submission', 'review');
  return json(await reviewDetail(appContext().database.db, context.params.id ?? ''));
});
