import { z } from 'zod';
import { UNIT_SYSTEM_COOKIE, UNIT_SYSTEMS } from '../../../lib/preferences/unit-system';
import { ApiError } from '../../../lib/server/http/api-error';
import { handleApi, issuesFromZod, json } from '../../../lib/server/http/respond';

export const prerender = false;

const bodySchema = z.object({
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose SI or US.' }),
  returnTo: z.string().optional(),
});

const ONE_YEAR_S = 365 * 24 * 3600;

/** Only a path on this site; anything else returns home, so the form cannot redirect elsewhere. */
function safeReturnPath(value: string | undefined): string {
  return value && /^\/(?![/\\])/.test(value) ? value : '/';
}

/** Stores the unit system in a cookie. A form post is redirected back; JSON gets JSON. */
export const POST = handleApi(async ({ request, cookies, redirect }) => {
  const isForm = (request.headers.get('content-type') ?? '').includes('form');
  const raw = isForm ? Object.fromEntries(await request.formData()) : await request.json().catch(() => null);
  const parsed = bodySchema.safeParse(raw);
  if (!parsed.success) {
    throw new ApiError('VALIDATION_FAILED', 'The unit system must be SI or US.', issuesFromZod(parsed.error));
  }
  cookies.set(UNIT_SYSTEM_COOKIE, parsed.data.unitSystem, { path: '/', maxAge: ONE_YEAR_S, sameSite: 'lax', httpOnly: true });
  if (isForm) return redirect(safeReturnPath(parsed.data.returnTo), 303);
  return json({ unitSystem: parsed.data.unitSystem });
});
