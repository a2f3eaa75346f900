/**
 * A bounded least-recently-used cache of answers (JSON text) by key, limited by the total length of
 * the text it holds, so a few large scatter answers cannot crowd the memory. A Map keeps insertion
 * order: a hit is moved to the end, and the oldest entries go first.
 */
export class ResultCache {
  private readonly entries = new Map<string, string>();
  private size = 0;

  constructor(
    private readonly maxChars: number,
    private readonly maxEntries = 500,
  ) {}

  get(key: string): string | undefined {
    const hit = this.entries.get(key);
    if (hit === undefined) return undefined;
    this.entries.delete(key);
    this.entries.set(key, hit);
    return hit;
  }

  set(key: string, text: string): void {
    if (text.length > this.maxChars) return;
    const old = this.entries.get(key);
    if (old !== undefined) {
      this.size -= old.length;
      this.entries.delete(key);
    }
    this.entries.set(key, text);
    this.size += text.length;
    for (const [oldest, value] of this.entries) {
      if (this.size <= this.maxChars && this.entries.size <= this.maxEntries) break;
      this.entries.delete(oldest);
      this.size -= value.length;
    }
  }

  stats(): { entries: number; chars: number } {
    return { entries: this.entries.size, chars: this.size };
  }
}
