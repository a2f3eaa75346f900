import { signUpSchema } from '../../../lib/schemas/account';
import { rethrowAuthError } from '../../../lib/server/auth/auth-errors';
import { enforceRateLimit } from '../../../lib/server/http/rate-limit-guard';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

export const SIGN_UP_ANSWER = 'Check your inbox: if this address can be used, a confirmation link is on its way.';

/** Creates an account and mails a confirmation link. An address already in use gets the same answer. */
export const POST = handleApi(async (context, app) => {
  const body = await readJsonBody(context.request, signUpSchema);
  await enforceRateLimit(context, 'sign-up');
  try {
    await app.auth.api.signUpEmail({
      body: { name: body.name, email: body.email, password: body.password, callbackURL: '/welcome' },
      headers: context.request.headers,
    });
  } catch (error) {
    rethrowAuthError(error, { PASSWORD_TOO_SHORT: 'The password is too short.', PASSWORD_TOO_LONG: 'The password is too long.' });
  }
  return json({ ok: true, message: SIGN_UP_ANSWER });
});
