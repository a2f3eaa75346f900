/**
 * The client address as the trusted proxies in front of the app saw it: with `hops` proxies each
 * appending to X-Forwarded-For, the entry the outermost one added. Null when no proxy is trusted or
 * the header is shorter than that (a client-written header is then ignored).
 */
export function trustedForwardedFor(header, hops) {
  if (!hops || !header) return null;
  const entries = String(header)
    .split(',')
    .map((entry) => entry.trim())
    .filter(Boolean);
  return entries.length >= hops ? entries[entries.length - hops] : null;
}
