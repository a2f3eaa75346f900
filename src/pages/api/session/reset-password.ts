import { resetPasswordSchema } from '../../../lib/schemas/account';
import { recordAudit } from '../../../lib/server/audit/audit-log';
import { rethrowAuthError } from '../../../lib/server/auth/auth-errors';
import { enforceRateLimit } from '../../../lib/server/http/rate-limit-guard';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** Sets a new password from a mailed token; every session of that person is signed out. */
export const POST = handleApi(async (context, app) => {
  const body = await readJsonBody(context.request, resetPasswordSchema);
  await enforceRateLimit(context, 'password-reset');
  try {
    await app.auth.api.resetPassword({
      body: { newPassword: body.password, token: body.token },
      headers: context.request.headers,
    });
  } catch (error) {
    rethrowAuthError(error, {}, 'This reset link has expired or was already used. Ask for a new one.');
  }
  await recordAudit(app.db, {
    actorUserId: null,
    firmId: null,
    action: 'auth.password_reset',
    ipAddress: context.clientAddress,
  });
  return json({ ok: true, message: 'Your password is changed and you are signed out everywhere. Sign in with the new one.' });
});
