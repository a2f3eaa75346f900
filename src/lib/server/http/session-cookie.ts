/** True when the request carries a better-auth session cookie (plain or __Secure- prefixed). */
export function hasSessionCookie(headers: Headers): boolean {
  const cookie = headers.get('cookie') ?? '';
  return /(?:^|;\s*)(?:__Secure-)?better-auth\.session_token=/.test(cookie);
}
