import { appContext } from '../../../../lib/server/app-context';
import { firmDepsFrom } from '../../../../lib/server/firms/firm-service';
import { invitationForRecipient } from '../../../../lib/server/firms/invitation-service';
import { requireIdentity } from '../../../../lib/server/http/guards';
import { handleApi, json } from '../../../../lib/server/http/respond';

export const prerender = false;

/** An invitation addressed to the signed-in person. */
export const GET = handleApi(async (context) => {
  const identity = requireIdentity(context);
  const { auth, database } = appContext();
  const invitation = await invitationForRecipient(
    firmDepsFrom(context, identity, { auth, db: database.db }),
    context.params.id ?? '',
  );
  const { firmId: _firmId, ...visible } = invitation;
  return json({ invitation: visible });
});
