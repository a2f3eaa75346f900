/**
 * The sign-in library's own HTTP routes that stay reachable under /api/auth. Everything the app does
 * goes through our endpoints (which call the library on the server); only links in mails must reach
 * the library itself. Any other path under /api/auth answers 404 in our error shape.
 */
export const LIBRARY_ROUTES = [
  {
    method: 'GET',
    path: '/api/auth/verify-email',
    why: 'the confirmation link in the sign-up mail; it signs the person in and forwards to /welcome',
  },
  {
    method: 'GET',
    path: '/api/auth/reset-password/:token',
    why: 'the link in the password-reset mail; it forwards to /reset-password with the token',
  },
] as const;

export type LibraryRoute = (typeof LIBRARY_ROUTES)[number];

function matchesPath(pattern: string, pathname: string): boolean {
  const want = pattern.split('/');
  const got = pathname.split('/');
  if (want.length !== got.length) return false;
  return want.every((part, i) => (part.startsWith(':') ? (got[i] ?? '') !== '' : part === got[i]));
}

/**
 * The allowed route for a request: `{ route }` when method and path match, `{ allow }` when the path
 * is one of ours but not the method (405, or OPTIONS), null when the path is not exposed (404).
 */
export function matchLibraryRoute(method: string, pathname: string): { route: LibraryRoute } | { allow: string[] } | null {
  const routes = LIBRARY_ROUTES.filter((route) => matchesPath(route.path, pathname));
  if (routes.length === 0) return null;
  const route = routes.find((r) => r.method === method.toUpperCase());
  return route ? { route } : { allow: [...new Set(routes.map((r) => r.method)), 'OPTIONS'] };
}
