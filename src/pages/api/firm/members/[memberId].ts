import { changeMemberRoleSchema } from '../../../../lib/contracts/firms';
import { changeMemberRole, removeMember } from '../../../../lib/server/firms/firm-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { authIdParam, readParams } from '../../../../lib/server/http/params';
import { readEmptyBody } from '../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

const params = { memberId: authIdParam };

/** Changes a member's role in the caller's active firm (owner or admin only). */
export const PATCH = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const { memberId } = readParams(context, params);
  const body = await readJsonBody(context.request, changeMemberRoleSchema);
  return json(await changeMemberRole(app, firmCallerOf(context, identity), activeFirmId(identity), memberId, body.role));
});

/** Removes a member from the caller's active firm (owner or admin only). */
export const DELETE = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const { memberId } = readParams(context, params);
  await readEmptyBody(context.request);
  await removeMember(app, firmCallerOf(context, identity), activeFirmId(identity), memberId);
  return new Response(null, { status: 204 });
});
