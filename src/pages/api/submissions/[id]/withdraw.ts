import { appContext } from '../../../../lib/server/app-context';
import { withdraw } from '../../../../lib/server/contribute/own-submissions';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Withdraws a submission that is not yet accepted. */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  await readEmptyBody(context.request);
  const contributor = {
    userId: identity.user.id,
    firmId: activeFirmId(identity),
    ipAddress: context.clientAddress,
    via: 'browser' as const,
  };
  return json({ submission: await withdraw(appContext().database.db, contributor, context.params.id ?? '') });
});
