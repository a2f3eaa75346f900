// The words of a query: plain words (the last one also a prefix while the user is still typing),
// "quoted phrases", and -excluded words or phrases. Only the first ten words count.
import type { TypoTolerance } from '../engine/settings';
import { tokenize } from '../text/normalize';

export type QueryTerm = { kind: 'word'; word: string; prefix: boolean; typos: number } | { kind: 'phrase'; words: string[] };

export interface QueryTerms {
  terms: QueryTerm[];
  excluded: QueryTerm[];
}

const MAX_WORDS = 10;

function allowedTypos(word: string, tolerance: TypoTolerance): number {
  if (!tolerance.enabled || tolerance.disableOnWords.some((w) => tokenize(w)[0] === word)) return 0;
  if (tolerance.disableOnNumbers && /^\p{N}+$/u.test(word)) return 0;
  const length = Array.from(word).length;
  if (length < tolerance.minWordSizeForTypos.oneTypo) return 0;
  return length < tolerance.minWordSizeForTypos.twoTypos ? 1 : 2;
}

export function readQuery(q: string, tolerance: TypoTolerance, stopWords: string[], prefixSearch: boolean): QueryTerms {
  const terms: QueryTerm[] = [];
  const excluded: QueryTerm[] = [];
  const stops = new Set(stopWords.flatMap(tokenize));
  let words = 0;
  const parts = q.match(/-?"[^"]*"?|[^\s"]+/g) ?? [];
  for (const part of parts) {
    if (words >= MAX_WORDS) break;
    const negative = part.startsWith('-') && part.length > 1;
    const body = negative ? part.slice(1) : part;
    if (body.startsWith('"')) {
      const phrase = tokenize(body.replaceAll('"', '')).slice(0, MAX_WORDS - words);
      words += phrase.length;
      if (phrase.length) (negative ? excluded : terms).push({ kind: 'phrase', words: phrase });
      continue;
    }
    for (const word of tokenize(body)) {
      if (words >= MAX_WORDS) break;
      words += 1;
      if (negative) excluded.push({ kind: 'word', word, prefix: false, typos: 0 });
      else if (!stops.has(word)) terms.push({ kind: 'word', word, prefix: false, typos: allowedTypos(word, tolerance) });
    }
  }
  const last = terms[terms.length - 1];
  const stillTyping = /[\p{L}\p{N}]$/u.test(q);
  if (last?.kind === 'word' && stillTyping && prefixSearch && words <= MAX_WORDS) last.prefix = true;
  return { terms, excluded };
}
