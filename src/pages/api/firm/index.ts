import { hasPermission } from '../../../lib/permissions/roles';
import { describeFirm } from '../../../lib/server/firms/firm-service';
import { firmCallerOf } from '../../../lib/server/http/acting';
import { activeFirmId, requireIdentity } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** The active firm: its members (and pending invitations for those who manage members). */
export const GET = handleApi(async (context, app) => {
  const identity = requireIdentity(context);
  const canManage = hasPermission(identity.actor, 'firm', 'manage-members');
  return json(await describeFirm(app, firmCallerOf(context, identity), activeFirmId(identity), canManage));
});
