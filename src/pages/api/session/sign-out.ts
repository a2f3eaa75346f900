import { appContext } from '../../../lib/server/app-context';
import { recordAudit } from '../../../lib/server/audit/audit-log';
import { readEmptyBody } from '../../../lib/server/http/read-body';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** Ends the current session. */
export const POST = handleApi(async (context) => {
  await readEmptyBody(context.request);
  const { auth, database } = appContext();
  const identity = context.locals.identity;
  const { headers } = await auth.api.signOut({ headers: context.request.headers, returnHeaders: true });
  if (identity) {
    await recordAudit(database.db, {
      actorUserId: identity.user.id,
      firmId: identity.actor.firmId,
      action: 'auth.sign_out',
      ipAddress: context.clientAddress,
    });
  }
  const response = json({ ok: true });
  for (const cookie of headers.getSetCookie()) response.headers.append('set-cookie', cookie);
  return response;
});
