import { signInSchema } from '../../../lib/schemas/account';
import { recordAudit } from '../../../lib/server/audit/audit-log';
import { authErrorCode } from '../../../lib/server/auth/auth-errors';
import { countSignInAttempt, forgiveSignIn } from '../../../lib/server/auth/failed-sign-ins';
import { ApiError } from '../../../lib/server/http/api-error';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * E-mail and password sign-in; the same answer whether the address is unknown or the password wrong.
 * Only failed attempts count against the account's and the address's allowance (failed-sign-ins.ts).
 */
export const POST = handleApi(async (context, app) => {
  const body = await readJsonBody(context.request, signInSchema);
  const attempt = { email: body.email, ipAddress: context.clientAddress };
  await countSignInAttempt(app, attempt);
  let signedIn: { headers: Headers };
  try {
    signedIn = await app.auth.api.signInEmail({
      body: { email: body.email, password: body.password, rememberMe: true },
      headers: context.request.headers,
      returnHeaders: true,
    });
  } catch (error) {
    const code = authErrorCode(error);
    await recordAudit(app.db, {
      actorUserId: null,
      firmId: null,
      action: 'auth.sign_in',
      outcome: 'failed',
      summary: { email: body.email, reason: code ?? 'error' },
      ipAddress: context.clientAddress,
    });
    if (code === 'EMAIL_NOT_VERIFIED') {
      throw new ApiError('FORBIDDEN', 'Confirm your e-mail address first. We have sent you a new confirmation link.');
    }
    if (code === 'BANNED_USER') throw new ApiError('FORBIDDEN', 'This account is suspended. Contact the platform admin.');
    if (code) throw new ApiError('UNAUTHENTICATED', 'The e-mail address or password is not right.');
    throw error;
  }
  await forgiveSignIn(app, attempt);
  const response = json({ ok: true });
  for (const cookie of signedIn.headers.getSetCookie()) response.headers.append('set-cookie', cookie);
  return response;
});
