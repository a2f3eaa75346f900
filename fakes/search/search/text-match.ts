// Which documents a text query matches and how well: per document the number of query words found
// (dropping words by the matching strategy), typos, first field and position, and exact matches.
import type { SearchIndex } from '../engine/search-index';
import type { DocWords } from '../text/text-index';
import type { MatchingStrategy } from './params';
import type { QueryTerm } from './query-terms';

export interface TextRank {
  words: number;
  typos: number;
  attribute: number;
  position: number;
  exact: number;
}

interface TermHit {
  typos: number;
  exact: boolean;
}

function containsPhrase(words: DocWords, phrase: string[]): boolean {
  for (const [, list] of words) {
    for (let i = 0; i + phrase.length <= list.length; i += 1) {
      if (phrase.every((w, j) => list[i + j] === w)) return true;
    }
  }
  return false;
}

function termHits(index: SearchIndex, term: QueryTerm): { hits: Map<number, TermHit>; words: Set<string> } {
  const hits = new Map<number, TermHit>();
  const words = new Set<string>();
  if (term.kind === 'phrase') {
    const [first, ...rest] = term.words;
    const posting = first === undefined ? undefined : index.text.posting(first);
    posting?.forEach((id) => {
      if (rest.every((w) => index.text.posting(w)?.has(id)) && containsPhrase(index.text.wordsOf(id), term.words)) {
        hits.set(id, { typos: 0, exact: true });
      }
    });
    for (const w of term.words) words.add(w);
    return { hits, words };
  }
  for (const d of index.text.derivations(term.word, term.typos, term.prefix)) {
    words.add(d.word);
    const exact = d.typos === 0 && !d.prefix;
    index.text.posting(d.word)?.forEach((id) => {
      const seen = hits.get(id);
      if (!seen || d.typos < seen.typos || (d.typos === seen.typos && exact && !seen.exact))
        hits.set(id, { typos: d.typos, exact });
    });
  }
  return { hits, words };
}

/** Matching documents with their rank data; `within` limits the documents considered. */
export function matchText(
  index: SearchIndex,
  terms: QueryTerm[],
  excluded: QueryTerm[],
  strategy: MatchingStrategy,
  within: (id: number) => boolean,
): Map<number, TextRank> {
  const perTerm = terms.map((term) => termHits(index, term));
  const order = perTerm.map((_, i) => i);
  if (strategy === 'frequency') order.sort((a, b) => (perTerm[a]?.hits.size ?? 0) - (perTerm[b]?.hits.size ?? 0) || a - b);
  const excludedIds = new Set<number>();
  for (const term of excluded)
    for (const id of termHits(index, { ...term, typos: 0, prefix: false } as QueryTerm).hits.keys()) excludedIds.add(id);
  const fieldRank = new Map(index.searchableFields().map((f, i) => [f, i]));
  const rankOfField = (field: string) =>
    fieldRank.get(field) ?? fieldRank.get(field.split('.')[0] as string) ?? Number.MAX_SAFE_INTEGER;
  // Which query term (by its place in the dropping order) each matched word belongs to.
  const termOfWord = new Map<string, number>();
  order.forEach((termIndex, place) => {
    for (const w of perTerm[termIndex]?.words ?? []) if (!termOfWord.has(w)) termOfWord.set(w, place);
  });
  const out = new Map<number, TextRank>();
  const lead = perTerm[order[0] as number];
  if (!lead) return out;
  for (const id of lead.hits.keys()) {
    if (!within(id) || excludedIds.has(id)) continue;
    let words = 0;
    let typos = 0;
    let exact = 0;
    for (const i of order) {
      const hit = perTerm[i]?.hits.get(id);
      if (!hit) break;
      words += 1;
      typos += hit.typos;
      if (hit.exact) exact += 1;
    }
    if (strategy === 'all' && words < terms.length) continue;
    let attribute = Number.MAX_SAFE_INTEGER;
    let position = Number.MAX_SAFE_INTEGER;
    index.text.forEachWord(id, (field, at, word) => {
      const place = termOfWord.get(word);
      if (place === undefined || place >= words) return;
      const rank = rankOfField(field);
      if (rank < attribute || (rank === attribute && at < position)) {
        attribute = rank;
        position = at;
      }
    });
    out.set(id, { words, typos, attribute, position, exact });
  }
  return out;
}
