import { defineMiddleware, sequence } from 'astro:middleware';
import { UNIT_SYSTEM_COOKIE, unitSystemFromCookie } from './lib/preferences/unit-system';
import { appServices } from './lib/server/app-context';
import { CLIENT_IP_HEADER } from './lib/server/auth/create-auth';
import { resolveIdentity } from './lib/server/auth/resolve-actor';
import { config } from './lib/server/config';
import { methodGuard } from './lib/server/http/method-guard';
import { errorResponse } from './lib/server/http/respond';
import { isCrossSiteWrite } from './lib/server/http/same-origin';
import { hasSessionCookie } from './lib/server/http/session-cookie';

const appOrigin = new URL(config.appUrl).origin;

const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

/** Headers on every response: nothing is loaded from elsewhere, nothing framed or sniffed. */
const securityHeaders = defineMiddleware(async (_context, next) => {
  const response = await next();
  const headers = response.headers;
  headers.set('content-security-policy', CONTENT_SECURITY_POLICY);
  headers.set('x-content-type-options', 'nosniff');
  headers.set('referrer-policy', 'same-origin');
  headers.set('x-frame-options', 'DENY');
  headers.set('permissions-policy', 'camera=(), microphone=(), geolocation=()');
  if (!headers.has('cache-control') && (headers.get('content-type') ?? '').includes('text/html')) {
    headers.set('cache-control', 'no-store');
  }
  return response;
});

/** Refuses state-changing requests from other sites (checked against APP_URL, so it holds behind a proxy). */
const sameOriginWrites = defineMiddleware((context, next) => {
  if (isCrossSiteWrite(context.request, appOrigin)) {
    return errorResponse(
      'FORBIDDEN',
      `Requests that change data must come from ${appOrigin}. If you use a proxy, set APP_URL to the address people open.`,
    );
  }
  return next();
});

const SKIP_SESSION = new Set(['/api/health']);

/**
 * Resolves per-request facts into locals: the app's services, the unit system, and the signed-in
 * person with their active firm and roles. It never decides who may see what; endpoints and pages
 * check permissions.
 */
const resolveLocals = defineMiddleware(async (context, next) => {
  const app = appServices();
  context.locals.app = app;
  context.request.headers.set(CLIENT_IP_HEADER, context.clientAddress);
  context.locals.unitSystem = unitSystemFromCookie(context.cookies.get(UNIT_SYSTEM_COOKIE)?.value);
  context.locals.identity = null;
  const path = context.url.pathname;
  if (SKIP_SESSION.has(path) || path.startsWith('/api/auth/') || !hasSessionCookie(context.request.headers)) return next();

  let refreshCookies: string[] = [];
  try {
    const { headers, response: session } = await app.auth.api.getSession({
      headers: context.request.headers,
      returnHeaders: true,
    });
    refreshCookies = headers.getSetCookie();
    if (session) context.locals.identity = await resolveIdentity(app.db, session);
  } catch (error) {
    console.error(
      '[session] could not resolve the session; treating the request as signed out:',
      error instanceof Error ? error.message : error,
    );
  }
  const response = await next();
  for (const cookie of refreshCookies) response.headers.append('set-cookie', cookie);
  return response;
});

/** 405 (with Allow) for a method an API endpoint does not export; 204 with Allow for OPTIONS. */
const apiMethods = methodGuard(import.meta.glob('./pages/api/**/*.ts'));

export const onRequest = sequence(securityHeaders, apiMethods, sameOriginWrites, resolveLocals);
