import { resubmit } from '../../../../lib/server/contribute/own-submissions';
import { contributorOf } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Sends a returned submission back to the stewards after corrections. */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const { id } = readParams(context, { id: uuidParam });
  await readEmptyBody(context.request);
  const result = await resubmit(app, contributorOf(context, identity), id);
  app.kickOutbox();
  return json(result);
});
