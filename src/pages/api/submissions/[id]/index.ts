import { ownSubmission } from '../../../../lib/server/contribute/own-submissions';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** One of the active firm's submissions, every record in full, with the steward's comments. */
export const GET = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'read');
  const { id } = readParams(context, { id: uuidParam });
  return json(await ownSubmission(app, activeFirmId(identity), id));
});
