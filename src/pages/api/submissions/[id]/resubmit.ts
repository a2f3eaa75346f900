import { appContext } from '../../../../lib/server/app-context';
import { config } from '../../../../lib/server/config';
import { resubmit } from '../../../../lib/server/contribute/own-submissions';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Sends a returned submission back to the stewards after corrections. */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  await readEmptyBody(context.request);
  const { database, outbox } = appContext();
  const contributor = {
    userId: identity.user.id,
    firmId: activeFirmId(identity),
    ipAddress: context.clientAddress,
    via: 'browser' as const,
  };
  const result = await resubmit(database.db, contributor, context.params.id ?? '', config.appUrl);
  outbox?.kick();
  return json({ submission: result });
});
