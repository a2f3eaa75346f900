import { appContext } from '../../../../lib/server/app-context';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { cancelInvitation } from '../../../../lib/server/firms/invitation-service';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Cancels a pending invitation of the caller's active firm. */
export const DELETE = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  await cancelInvitation(
    firmDepsFrom(context, identity, { auth, db: database.db }),
    activeFirmId(identity),
    context.params.id ?? '',
  );
  return new Response(null, { status: 204 });
});
