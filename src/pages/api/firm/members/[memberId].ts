import { changeMemberRoleSchema } from '../../../../lib/schemas/firm';
import { appContext } from '../../../../lib/server/app-context';
import { changeMemberRole, firmDepsFrom, removeMember } from '../../../../lib/server/firms/firm-service';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Changes a member's role in the caller's active firm (owner or admin only). */
export const PATCH = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const body = await readJsonBody(context.request, changeMemberRoleSchema);
  const { auth, database } = appContext();
  const member = await changeMemberRole(
    firmDepsFrom(context, identity, { auth, db: database.db }),
    activeFirmId(identity),
    context.params.memberId ?? '',
    body.role,
  );
  return json({ member });
});

/** Removes a member from the caller's active firm (owner or admin only). */
export const DELETE = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  await removeMember(
    firmDepsFrom(context, identity, { auth, db: database.db }),
    activeFirmId(identity),
    context.params.memberId ?? '',
  );
  return new Response(null, { status: 204 });
});
