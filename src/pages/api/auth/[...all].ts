import { appContext } from '../../../lib/server/app-context';
import { CLIENT_IP_HEADER } from '../../../lib/server/auth/create-auth';
import { libraryAnswer } from '../../../lib/server/auth/library-response';
import { matchLibraryRoute } from '../../../lib/server/auth/library-routes';
import { ApiError } from '../../../lib/server/http/api-error';
import { handleApi } from '../../../lib/server/http/respond';

export const prerender = false;

/**
 * The sign-in library's own routes, limited to the allow-list in library-routes.ts (the links in
 * mails); every other path here is 404, a wrong method 405. Answers are translated into our error
 * shape. The client address comes from the socket; a header of the same name sent by the client is
 * overwritten.
 */
export const ALL = handleApi(async ({ request, clientAddress, url }) => {
  const match = matchLibraryRoute(request.method, url.pathname);
  if (!match) throw new ApiError('NOT_FOUND', 'There is no such API endpoint. The README lists the endpoints.');
  if ('allow' in match) {
    const headers = { allow: match.allow.join(', '), 'cache-control': 'no-store' };
    if (request.method.toUpperCase() === 'OPTIONS') return new Response(null, { status: 204, headers });
    throw new ApiError('METHOD_NOT_ALLOWED', `This link takes ${match.allow[0]} requests only.`, undefined, headers);
  }
  request.headers.set(CLIENT_IP_HEADER, clientAddress);
  return libraryAnswer(await appContext().auth.handler(request));
});
