/**
 * A path on this site only: it starts with a single `/` and holds nothing but the characters a URL
 * path and query may carry unescaped (RFC 3986 §3.3–3.4). Anything else (another host, `//`, a
 * backslash, a tab or newline, other control or non-ASCII characters) returns home, so a form cannot
 * redirect elsewhere.
 */
export function safeReturnPath(value: string | undefined): string {
  return value && /^\/(?![/\\])[A-Za-z0-9\-._~!$&'()*+,;=:@%/?]*$/.test(value) ? value : '/';
}
