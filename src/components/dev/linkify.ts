export type TextPart = { kind: 'text'; value: string } | { kind: 'link'; value: string };

const URL_PATTERN = /https?:\/\/[^\s<>"')]+/g;

/** Splits plain text into text and http(s) link parts, so links can be rendered without HTML injection. */
export function linkify(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    if (start > last) parts.push({ kind: 'text', value: text.slice(last, start) });
    parts.push({ kind: 'link', value: match[0] });
    last = start + match[0].length;
  }
  if (last < text.length) parts.push({ kind: 'text', value: text.slice(last) });
  return parts;
}
