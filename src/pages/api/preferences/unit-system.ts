import { UNIT_SYSTEM_COOKIE } from '../../../lib/preferences/unit-system';
import { unitSystemChoiceSchema } from '../../../lib/schemas/unit-system';
import { handleApi, json, readFormBody, readJsonBody } from '../../../lib/server/http/respond';
import { safeReturnPath } from '../../../lib/server/http/return-path';

export const prerender = false;

const ONE_YEAR_S = 365 * 24 * 3600;

/** Stores the unit system in a cookie. A form post is redirected back (to a path on this site only); JSON gets JSON. */
export const POST = handleApi(async ({ request, cookies, redirect }) => {
  const isForm = (request.headers.get('content-type') ?? '').includes('form');
  const choice = isForm
    ? await readFormBody(request, unitSystemChoiceSchema)
    : await readJsonBody(request, unitSystemChoiceSchema);
  cookies.set(UNIT_SYSTEM_COOKIE, choice.unitSystem, { path: '/', maxAge: ONE_YEAR_S, sameSite: 'lax', httpOnly: true });
  if (isForm) return redirect(safeReturnPath(choice.returnTo), 303);
  return json({ unitSystem: choice.unitSystem });
});
