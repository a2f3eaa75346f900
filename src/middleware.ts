import { defineMiddleware, sequence } from 'astro:middleware';
import { UNIT_SYSTEM_COOKIE, unitSystemFromCookie } from './lib/preferences/unit-system';
import { config } from './lib/server/config';
import { errorResponse } from './lib/server/http/respond';
import { isCrossSiteWrite } from './lib/server/http/same-origin';

const appOrigin = new URL(config.appUrl).origin;

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

/** Resolves per-request facts into locals; it never decides who may see what. */
const resolveLocals = defineMiddleware((context, next) => {
  context.locals.unitSystem = unitSystemFromCookie(context.cookies.get(UNIT_SYSTEM_COOKIE)?.value);
  return next();
});

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

export const onRequest = sequence(securityHeaders, sameOriginWrites, resolveLocals);
