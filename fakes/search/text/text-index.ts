// The words of the searchable fields: a posting list per word, each document's words per field (for
// phrases, attribute order and positions), and lookups with prefix and typo tolerance.
import { Posting } from '../engine/posting';
import { typoCost } from './typo-distance';

export interface Derivation {
  word: string;
  typos: number;
  /** Matched as a prefix of a longer word rather than as the whole word. */
  prefix: boolean;
}

/** A document's words, per searchable field, in field order. */
export type DocWords = Array<[field: string, words: string[]]>;

export class TextIndex {
  private readonly postings = new Map<string, Posting>();
  private readonly docWords: Array<DocWords | undefined> = [];
  private sortedWords: string[] | null = null;
  private readonly cache = new Map<string, Derivation[]>();

  add(id: number, words: DocWords): void {
    this.docWords[id] = words;
    for (const [, list] of words) {
      for (const word of list) {
        let posting = this.postings.get(word);
        if (!posting) {
          posting = new Posting();
          this.postings.set(word, posting);
          this.sortedWords = null;
          this.cache.clear();
        }
        posting.add(id);
      }
    }
  }

  remove(id: number): void {
    const words = this.docWords[id];
    if (!words) return;
    for (const [, list] of words) {
      for (const word of list) {
        const posting = this.postings.get(word);
        if (!posting) continue;
        posting.remove(id);
        if (posting.size === 0) {
          this.postings.delete(word);
          this.sortedWords = null;
          this.cache.clear();
        }
      }
    }
    this.docWords[id] = undefined;
  }

  wordsOf(id: number): DocWords {
    return this.docWords[id] ?? [];
  }

  posting(word: string): Posting | undefined {
    return this.postings.get(word);
  }

  private sorted(): string[] {
    if (!this.sortedWords) this.sortedWords = [...this.postings.keys()].sort();
    return this.sortedWords;
  }

  /** The indexed words a query word matches, with their typo cost. */
  derivations(query: string, allowedTypos: number, asPrefix: boolean): Derivation[] {
    const cacheKey = `${allowedTypos}:${asPrefix ? 1 : 0}:${query}`;
    const cached = this.cache.get(cacheKey);
    if (cached) return cached;
    const out: Derivation[] = [];
    const words = this.sorted();
    if (allowedTypos === 0) {
      if (this.postings.has(query)) out.push({ word: query, typos: 0, prefix: false });
      if (asPrefix) {
        for (let i = lowerBoundText(words, query); i < words.length && (words[i] as string).startsWith(query); i += 1) {
          if (words[i] !== query) out.push({ word: words[i] as string, typos: 0, prefix: true });
        }
      }
    } else {
      const length = Array.from(query).length;
      for (const word of words) {
        const wordLength = word.length;
        if (!asPrefix && Math.abs(wordLength - length) > allowedTypos) continue;
        if (asPrefix && wordLength < length - allowedTypos) continue;
        const whole = typoCost(query, word, allowedTypos, false);
        if (whole >= 0) {
          out.push({ word, typos: whole, prefix: false });
          continue;
        }
        if (asPrefix) {
          const cost = typoCost(query, word, allowedTypos, true);
          if (cost >= 0) out.push({ word, typos: cost, prefix: true });
        }
      }
    }
    if (this.cache.size > 5000) this.cache.clear();
    this.cache.set(cacheKey, out);
    return out;
  }
}

function lowerBoundText(sorted: string[], value: string): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((sorted[mid] as string) < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
