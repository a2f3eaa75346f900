import { hasPermission } from '../../../lib/permissions/roles';
import { appContext } from '../../../lib/server/app-context';
import { describeFirm, firmDepsFrom } from '../../../lib/server/firms/firm-service';
import { activeFirmId, requireIdentity } from '../../../lib/server/http/guards';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** The active firm: its members (and pending invitations for those who manage members). */
export const GET = handleApi(async (context) => {
  const identity = requireIdentity(context);
  const firmId = activeFirmId(identity);
  const { auth, database } = appContext();
  const canManage = hasPermission(identity.actor, 'firm', 'manage-members');
  return json(await describeFirm(firmDepsFrom(context, identity, { auth, db: database.db }), firmId, canManage));
});
