import { CLIENT_IP_HEADER } from '../../../lib/server/auth/create-auth';
import { matchLibraryRoute } from '../../../lib/server/auth/library-routes';
import { ApiError } from '../../../lib/server/http/api-error';
import { libraryAnswer } from '../../../lib/server/http/library-response';
import { authIdParam, readParams } from '../../../lib/server/http/params';
import { handleApi } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * The sign-in library's own routes, limited to the allow-list in library-routes.ts (the links in
 * mails); every other path here is 404, a wrong method 405. A token in the path is checked like every
 * other id the library makes (letters and digits; anything else 404) before the library sees it.
 * Answers are translated into our error shape. The client address comes from the socket; a header of the same name sent by the client is
 * overwritten.
 */
export const ALL = handleApi(async ({ request, clientAddress, url }, app) => {
  const match = matchLibraryRoute(request.method, url.pathname);
  if (!match) throw new ApiError('NOT_FOUND', 'There is no such API endpoint. The README lists the endpoints.');
  if ('allow' in match) {
    const headers = { allow: match.allow.join(', '), 'cache-control': 'no-store' };
    if (request.method.toUpperCase() === 'OPTIONS') return new Response(null, { status: 204, headers });
    throw new ApiError('METHOD_NOT_ALLOWED', `This link takes ${match.allow[0]} requests only.`, undefined, headers);
  }
  readParams({ params: match.params }, Object.fromEntries(Object.keys(match.params).map((name) => [name, authIdParam])));
  request.headers.set(CLIENT_IP_HEADER, clientAddress);
  return libraryAnswer(await app.auth.handler(request));
});
