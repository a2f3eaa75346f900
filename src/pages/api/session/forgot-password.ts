import { forgotPasswordSchema } from '../../../lib/schemas/account';
import { enforceRateLimit } from '../../../lib/server/http/rate-limit-guard';
import { handleApi, json, readJsonBody } from '../../../lib/server/http/respond';

export const prerender = false;

/** Mails a reset link when the address has an account; always the same answer. */
export const POST = handleApi(async (context, app) => {
  const body = await readJsonBody(context.request, forgotPasswordSchema);
  await enforceRateLimit(context, 'password-reset');
  await enforceRateLimit(context, 'password-reset-mail', body.email);
  await app.auth.api.requestPasswordReset({
    body: { email: body.email, redirectTo: `${app.appUrl}/reset-password` },
    headers: context.request.headers,
  });
  return json({ ok: true, message: 'If this address has an account, a reset link is on its way. It works for one hour.' });
});
