import { inviteMemberSchema } from '../../../../lib/contracts/firms';
import { inviteMember } from '../../../../lib/server/firms/invitation-service';
import { firmCallerOf } from '../../../../lib/server/http/acting';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Invites someone by e-mail to the caller's active firm (owner or admin only). */
export const POST = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const body = await readJsonBody(context.request, inviteMemberSchema);
  return json(await inviteMember(app, firmCallerOf(context, identity), activeFirmId(identity), body.email, body.role), 201);
});
