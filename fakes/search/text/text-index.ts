// The words of the searchable fields: a posting list per word, each document's words per field as
// word numbers (for phrases, attribute order and positions), and lookups with prefix and typo tolerance.
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
  private readonly wordIds = new Map<string, number>();
  private readonly words: string[] = [];
  private readonly postings: Array<Posting | undefined> = [];
  private readonly fieldIds = new Map<string, number>();
  private readonly fieldNames: string[] = [];
  /** Per document: for each field, -(field number + 1) then the field's word numbers. */
  private readonly docWords: Array<Int32Array | undefined> = [];
  private sortedWords: string[] | null = null;
  private readonly cache = new Map<string, Derivation[]>();

  private wordId(word: string): number {
    let id = this.wordIds.get(word);
    if (id === undefined) {
      id = this.words.length;
      this.wordIds.set(word, id);
      this.words.push(word);
    }
    return id;
  }

  private fieldId(field: string): number {
    let id = this.fieldIds.get(field);
    if (id === undefined) {
      id = this.fieldNames.length;
      this.fieldIds.set(field, id);
      this.fieldNames.push(field);
    }
    return id;
  }

  add(id: number, fields: DocWords): void {
    let size = 0;
    for (const [, list] of fields) size += list.length + 1;
    const packed = new Int32Array(size);
    let at = 0;
    for (const [field, list] of fields) {
      packed[at++] = -(this.fieldId(field) + 1);
      for (const word of list) {
        const wordId = this.wordId(word);
        packed[at++] = wordId;
        let posting = this.postings[wordId];
        if (!posting || posting.size === 0) {
          posting ??= new Posting();
          this.postings[wordId] = posting;
          this.sortedWords = null;
          this.cache.clear();
        }
        posting.add(id);
      }
    }
    this.docWords[id] = packed;
  }

  remove(id: number): void {
    const packed = this.docWords[id];
    if (!packed) return;
    for (const wordId of packed) {
      if (wordId < 0) continue;
      const posting = this.postings[wordId];
      if (!posting) continue;
      posting.remove(id);
      if (posting.size === 0) {
        this.sortedWords = null;
        this.cache.clear();
      }
    }
    this.docWords[id] = undefined;
  }

  /** Calls `visit(field, position, word)` for every word of a document, field by field. */
  forEachWord(id: number, visit: (field: string, position: number, word: string) => void): void {
    const packed = this.docWords[id];
    if (!packed) return;
    let field = '';
    let position = 0;
    for (const value of packed) {
      if (value < 0) {
        field = this.fieldNames[-value - 1] as string;
        position = 0;
      } else {
        visit(field, position, this.words[value] as string);
        position += 1;
      }
    }
  }

  wordsOf(id: number): DocWords {
    const out: DocWords = [];
    this.forEachWord(id, (field, position, word) => {
      if (position === 0) out.push([field, []]);
      out[out.length - 1]?.[1].push(word);
    });
    return out;
  }

  posting(word: string): Posting | undefined {
    const id = this.wordIds.get(word);
    const posting = id === undefined ? undefined : this.postings[id];
    return posting?.size ? posting : undefined;
  }

  private sorted(): string[] {
    if (!this.sortedWords) this.sortedWords = this.words.filter((_, i) => (this.postings[i]?.size ?? 0) > 0).sort();
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
      if (this.posting(query)) out.push({ word: query, typos: 0, prefix: false });
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
