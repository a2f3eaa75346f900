import { signInSchema } from '../../../lib/schemas/account';
import { recordAudit } from '../../../lib/server/audit/audit-log';
import { authErrorCode } from '../../../lib/server/auth/auth-errors';
import { ApiError } from '../../../lib/server/http/api-error';
import { enforceRateLimit } from '../../../lib/server/http/rate-limit-guard';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** E-mail and password sign-in; the same answer whether the address is unknown or the password wrong. */
export const POST = handleApi(async (context, app) => {
  const body = await readJsonBody(context.request, signInSchema);
  await enforceRateLimit(context, 'sign-in');
  try {
    const { headers } = await app.auth.api.signInEmail({
      body: { email: body.email, password: body.password, rememberMe: true },
      headers: context.request.headers,
      returnHeaders: true,
    });
    const response = json({ ok: true });
    for (const cookie of headers.getSetCookie()) response.headers.append('set-cookie', cookie);
    return response;
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
});
