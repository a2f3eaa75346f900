const hasControlCharacter = (text: string) => [...text].some((char) => char.charCodeAt(0) < 0x20 || char.charCodeAt(0) === 0x7f);

/**
 * The path to open after signing in: only a path on this site (one leading slash, no scheme, no
 * host, no backslash tricks), else the fallback.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/welcome'): string {
  if (!next?.startsWith('/')) return fallback;
  if (next.startsWith('//') || next.includes('\\') || hasControlCharacter(next)) return fallback;
  return next;
}

/** The sign-in address that comes back to `path` afterwards (slashes left readable). */
export function signInPathFor(path: string): string {
  return `/sign-in?next=${encodeURIComponent(safeNextPath(path)).replaceAll('%2F', '/')}`;
}
