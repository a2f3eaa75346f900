import { auditedBy, recordAudit } from '../../../lib/server/audit/audit-log';
import { actingPerson } from '../../../lib/server/http/acting';
import { readEmptyBody } from '../../../lib/server/http/read-body';
import { handleApi, json } from '../../../lib/server/http/respond';

export const prerender = false;

/** Ends the current session. */
export const POST = handleApi(async (context, app) => {
  await readEmptyBody(context.request);
  const identity = context.locals.identity;
  const { headers } = await app.auth.api.signOut({ headers: context.request.headers, returnHeaders: true });
  if (identity) {
    await recordAudit(app.db, { ...auditedBy(actingPerson(context, identity)), action: 'auth.sign_out' });
  }
  const response = json({ ok: true });
  for (const cookie of headers.getSetCookie()) response.headers.append('set-cookie', cookie);
  return response;
});
