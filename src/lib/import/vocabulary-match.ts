/** A region or geological unit from the bank's vocabulary. */
export interface VocabularyEntry {
  id: string;
  name: string;
  slug: string;
  /** other names uploads may use (earlier names, names of units merged into it) */
  synonyms?: readonly string[];
  /** a retired entry takes no new uploads */
  retired?: boolean;
}

/** Lower case, accents dropped, runs of anything but letters and digits as one hyphen ("Vennmoor  Flats" → "vennmoor-flats"). */
export function slugify(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}

/**
 * Looks names up in one vocabulary list: a name, slug or synonym matches whatever its case, spacing and
 * punctuation (an entry's own name wins over another's synonym). `closest` suggests the nearest entry in
 * use for a misspelling (edit distance up to a quarter of the length, at least 2).
 */
export class VocabularyIndex {
  private readonly bySlug = new Map<string, VocabularyEntry>();
  readonly entries: readonly VocabularyEntry[];

  constructor(entries: readonly VocabularyEntry[]) {
    this.entries = entries;
    for (const entry of entries) {
      for (const synonym of entry.synonyms ?? []) this.bySlug.set(slugify(synonym), entry);
    }
    for (const entry of entries) {
      this.bySlug.set(slugify(entry.slug), entry);
      this.bySlug.set(slugify(entry.name), entry);
    }
  }

  /** The entries that take new uploads. */
  get inUse(): readonly VocabularyEntry[] {
    return this.entries.filter((entry) => !entry.retired);
  }

  find(text: string): VocabularyEntry | null {
    const slug = slugify(text);
    return slug === '' ? null : (this.bySlug.get(slug) ?? null);
  }

  closest(text: string): VocabularyEntry | null {
    const slug = slugify(text);
    if (slug.length === 0 || slug.length > 200) return null;
    let best: VocabularyEntry | null = null;
    let bestDistance = Math.max(2, Math.floor(slug.length / 4)) + 1;
    for (const entry of this.inUse) {
      const d = editDistance(slug, slugify(entry.name));
      if (d < bestDistance) {
        best = entry;
        bestDistance = d;
      }
    }
    return best;
  }
}

function editDistance(a: string, b: string): number {
  if (Math.abs(a.length - b.length) > 10) return Number.POSITIVE_INFINITY;
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, (previous[j - 1] ?? 0) + cost);
    }
    previous = current;
  }
  return previous[b.length] ?? 0;
}
