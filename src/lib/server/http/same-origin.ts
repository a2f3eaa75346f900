const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * True when a state-changing request comes from another site: its Origin (or, failing that, the
 * browser's Sec-Fetch-Site) does not match the app's own origin (APP_URL). Requests without either
 * header come from scripts, not browsers, and carry no ambient cookies to abuse.
 */
export function isCrossSiteWrite(request: Request, appOrigin: string): boolean {
  if (!UNSAFE_METHODS.has(request.method.toUpperCase())) return false;
  const origin = request.headers.get('origin');
  if (origin) return origin !== appOrigin;
  const fetchSite = request.headers.get('sec-fetch-site');
  return fetchSite === 'cross-site' || fetchSite === 'same-site';
}
