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

/** The path's values for the pattern's `:name` segments, or null when the path does not fit the pattern. */
function matchPath(pattern: string, pathname: string): Record<string, string> | null {
  const want = pattern.split('/');
  const got = pathname.split('/');
  if (want.length !== got.length) return null;
  const params: Record<string, string> = {};
  for (const [i, part] of want.entries()) {
    const value = got[i] ?? '';
    if (part.startsWith(':')) {
      if (value === '') return null;
      params[part.slice(1)] = value;
    } else if (part !== value) {
      return null;
    }
  }
  return params;
}

/**
 * The allowed route for a request: `{ route, params }` when method and path match (params still
 * encoded, as they came), `{ allow }` when the path is one of ours but not the method (405, or
 * OPTIONS), null when the path is not exposed (404).
 */
export function matchLibraryRoute(
  method: string,
  pathname: string,
): { route: LibraryRoute; params: Record<string, string> } | { allow: string[] } | null {
  const matches = LIBRARY_ROUTES.flatMap((route) => {
    const params = matchPath(route.path, pathname);
    return params ? [{ route, params }] : [];
  });
  if (matches.length === 0) return null;
  const match = matches.find((m) => m.route.method === method.toUpperCase());
  return match ?? { allow: [...new Set(matches.map((m) => m.route.method)), 'OPTIONS'] };
}
