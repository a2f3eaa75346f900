import { inviteMemberSchema } from '../../../../lib/schemas/firm';
import { appContext } from '../../../../lib/server/app-context';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { inviteMember } from '../../../../lib/server/firms/invitation-service';
import { activeFirmId, requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';

export const prerender = false;

/** Invites someone by e-mail to the caller's active firm (owner or admin only). */
export const POST = handleApi(async (context) => {
  const identity = await requirePermission(context, 'firm', 'manage-members');
  const body = await readJsonBody(context.request, inviteMemberSchema);
  const { auth, database } = appContext();
  const invitation = await inviteMember(
    firmDepsFrom(context, identity, { auth, db: database.db }),
    activeFirmId(identity),
    body.email,
    body.role,
  );
  return json({ invitation }, 201);
});
