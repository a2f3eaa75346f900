import type { FieldIssue } from './api-error';

/** No request body of ours is nested anywhere near this deep; a deeper one is refused before parsing. */
export const MAX_JSON_DEPTH = 32;
/** At most this many text problems are listed in one answer. */
const MAX_TEXT_ISSUES = 20;

const OPEN_BRACE = 0x7b;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACE = 0x7d;
const CLOSE_BRACKET = 0x5d;
const QUOTE = 0x22;
const BACKSLASH = 0x5c;

/**
 * How deeply JSON text nests objects and arrays, counted without parsing (brackets inside strings do
 * not count). Stops counting once `limit` is passed, so a hostile body costs one linear scan.
 */
export function jsonNestingDepth(text: string, limit = Number.POSITIVE_INFINITY): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === BACKSLASH) i++;
      else if (c === QUOTE) inString = false;
    } else if (c === QUOTE) {
      inString = true;
    } else if (c === OPEN_BRACE || c === OPEN_BRACKET) {
      depth++;
      if (depth > deepest) {
        deepest = depth;
        if (deepest > limit) return deepest;
      }
    } else if (c === CLOSE_BRACE || c === CLOSE_BRACKET) {
      depth--;
    }
  }
  return deepest;
}

/** Why a piece of text cannot be stored, or null when it can. */
export function unstorableTextReason(text: string): string | null {
  if (text.includes('\u0000')) return 'contains a NUL character (\\u0000), which cannot be stored. Remove it.';
  if (!text.isWellFormed()) {
    return 'contains a broken character (an unpaired UTF-16 surrogate such as \\ud800). Send the text as valid Unicode.';
  }
  return null;
}

const KEYS_REFUSED = new Set(['__proto__']);

/**
 * Every string (keys included) in a parsed JSON value that cannot be stored: NUL characters and unpaired
 * surrogates, which PostgreSQL refuses, and the key `__proto__`. Paths are dotted (`layers.0.name`); a
 * problem in a key names the key itself. Walks without recursion, so any nesting is safe.
 */
export function unstorableTextIssues(value: unknown): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const stack: { value: unknown; path: string }[] = [{ value, path: '' }];
  const join = (path: string, key: string | number) => (path === '' ? String(key) : `${path}.${key}`);
  while (stack.length > 0 && issues.length < MAX_TEXT_ISSUES) {
    const { value: current, path } = stack.pop() as { value: unknown; path: string };
    if (typeof current === 'string') {
      const reason = unstorableTextReason(current);
      if (reason) issues.push({ path, message: `The text ${reason}` });
    } else if (Array.isArray(current)) {
      for (let i = current.length - 1; i >= 0; i--) stack.push({ value: current[i], path: join(path, i) });
    } else if (current !== null && typeof current === 'object') {
      const children: { value: unknown; path: string }[] = [];
      for (const key of Object.keys(current)) {
        const reason = KEYS_REFUSED.has(key) ? 'is not accepted anywhere.' : unstorableTextReason(key);
        if (reason) issues.push({ path: join(path, key), message: `The key ${reason}` });
        else children.push({ value: (current as Record<string, unknown>)[key], path: join(path, key) });
      }
      for (let i = children.length - 1; i >= 0; i--) stack.push(children[i] as { value: unknown; path: string });
    }
  }
  return issues;
}
