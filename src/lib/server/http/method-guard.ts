import type { MiddlewareHandler } from 'astro';
import { errorResponse } from './respond';

const ENDPOINT_METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

export type RouteModules = Record<string, () => Promise<unknown>>;

/**
 * The methods an endpoint module answers: its exported handlers, HEAD wherever GET is (Astro answers
 * it with the GET handler, without the body), and OPTIONS (answered here). Null for a module that
 * handles every method itself (`ALL`).
 */
export function allowedMethods(module: Record<string, unknown>): string[] | null {
  if (typeof module.ALL === 'function') return null;
  const methods: string[] = ENDPOINT_METHODS.filter((method) => typeof module[method] === 'function');
  if (methods.includes('GET')) methods.push('HEAD');
  methods.push('OPTIONS');
  return methods;
}

/**
 * The keys an `import.meta.glob('./pages/api/**')` map may give a route pattern's file (`/api/x` → x.ts
 * or x/index.ts), lower-cased: Astro lower-cases the pattern (`[memberId]` arrives as `[memberid]`).
 */
function moduleKeysOf(routePattern: string): string[] {
  const pattern = routePattern.toLowerCase();
  return [`./pages${pattern}.ts`, `./pages${pattern}/index.ts`];
}

/**
 * Middleware for /api/*: a method the endpoint does not export answers 405 METHOD_NOT_ALLOWED in the
 * one error shape with an Allow header (Astro alone would render the HTML 404 page), and OPTIONS
 * answers 204 with the same Allow header. Nothing else is run for such a request. The catch-all
 * routes, which export ALL, decide for themselves.
 */
export function methodGuard(modules: RouteModules): MiddlewareHandler {
  const byKey = new Map(Object.entries(modules).map(([key, load]) => [key.toLowerCase(), load]));
  return async (context, next) => {
    if (!context.url.pathname.startsWith('/api/')) return next();
    const key = moduleKeysOf(context.routePattern).find((candidate) => byKey.has(candidate));
    const load = key ? byKey.get(key) : undefined;
    if (!load) return next();
    const allow = allowedMethods((await load()) as Record<string, unknown>);
    if (!allow) return next();
    const method = context.request.method.toUpperCase();
    if (allow.includes(method) && method !== 'OPTIONS') return next();
    const headers = { allow: allow.join(', '), 'cache-control': 'no-store' };
    if (method === 'OPTIONS') return new Response(null, { status: 204, headers });
    const usable = allow.filter((m) => m !== 'HEAD' && m !== 'OPTIONS').join(' or ');
    return errorResponse(
      'METHOD_NOT_ALLOWED',
      `This endpoint does not take ${method} requests; use ${usable}.`,
      undefined,
      headers,
    );
  };
}
