import { appContext } from '../../../../lib/server/app-context';
import { ownSubmission } from '../../../../lib/server/contribute/own-submissions';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** One of the active firm's submissions, every record in full, with the steward's comments. */
export const GET = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'read');
  return json(await ownSubmission(appContext().database.db, activeFirmId(identity), context.params.id ?? ''));
});
