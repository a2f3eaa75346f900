import type { APIRoute } from 'astro';
import { CLIENT_IP_HEADER } from '../../../lib/server/auth/create-auth';

export const prerender = false;

/**
 * better-auth's own routes (verify e-mail, session, firm management it serves, API keys). The client
 * address comes from the socket; a header of the same name sent by the client is overwritten.
 */
export const ALL: APIRoute = async ({ request, clientAddress, locals }) => {
  request.headers.set(CLIENT_IP_HEADER, clientAddress);
  return locals.app.auth.handler(request);
};
