// One index: its documents (by internal number), settings, facet data per field and the text index.
import { TypedFastBitSet } from 'typedfastbitset';
import { tokenize } from '../text/normalize';
import { type DocWords, TextIndex } from '../text/text-index';
import { inAttributeList, ruleMatches } from './attribute-patterns';
import { type Doc, documentFacts, textValues, valueAtPath } from './documents';
import { FieldIndex } from './field-index';
import { defaultSettings, type Settings } from './settings';

export class SearchIndex {
  readonly uid: string;
  primaryKey: string | null;
  readonly createdAt: string;
  updatedAt: string;
  settings: Settings = defaultSettings();
  /** Every field path ever seen, in order of first appearance. */
  readonly fields: string[] = [];
  private readonly fieldSet = new Set<string>();
  readonly alive = new TypedFastBitSet();
  readonly docs: Array<Doc | undefined> = [];
  readonly externalIds: Array<string | undefined> = [];
  readonly internalIds = new Map<string, number>();
  readonly facets = new Map<string, FieldIndex>();
  private readonly facetedCache = new Map<string, boolean>();
  text = new TextIndex();
  private nextId = 0;

  constructor(uid: string, primaryKey: string | null, createdAt = new Date().toISOString()) {
    this.uid = uid;
    this.primaryKey = primaryKey;
    this.createdAt = createdAt;
    this.updatedAt = createdAt;
  }

  get documentCount(): number {
    return this.internalIds.size;
  }

  touch(): void {
    this.updatedAt = new Date().toISOString();
  }

  /** Stores a document under an external id, replacing any earlier one. */
  put(externalId: string, doc: Doc): void {
    const previous = this.internalIds.get(externalId);
    if (previous !== undefined) this.removeInternal(previous);
    // A replaced document keeps its place in storage order, as the engine keeps its internal id.
    const id = previous ?? this.nextId;
    if (previous === undefined) this.nextId += 1;
    this.docs[id] = doc;
    this.externalIds[id] = externalId;
    this.internalIds.set(externalId, id);
    this.alive.add(id);
    for (const [path, facts] of documentFacts(doc)) {
      if (!this.fieldSet.has(path)) {
        this.fieldSet.add(path);
        this.fields.push(path);
      }
      if (this.isFaceted(path)) this.facetField(path).add(id, facts);
    }
    this.text.add(id, this.wordsOf(doc));
  }

  delete(externalId: string): boolean {
    const id = this.internalIds.get(externalId);
    if (id === undefined) return false;
    this.removeInternal(id);
    return true;
  }

  private removeInternal(id: number): void {
    const doc = this.docs[id] as Doc;
    for (const [path, facts] of documentFacts(doc)) if (this.isFaceted(path)) this.facets.get(path)?.remove(id, facts);
    this.text.remove(id);
    this.internalIds.delete(this.externalIds[id] as string);
    this.docs[id] = undefined;
    this.externalIds[id] = undefined;
    this.alive.remove(id);
  }

  getByExternal(externalId: string): Doc | undefined {
    const id = this.internalIds.get(externalId);
    return id === undefined ? undefined : this.docs[id];
  }

  /** The searchable fields in their ranking order. */
  searchableFields(): string[] {
    const list = this.settings.searchableAttributes;
    if (list.includes('*')) return this.fields.filter((f) => !f.includes('.'));
    return list;
  }

  private wordsOf(doc: Doc): DocWords {
    const list = this.settings.searchableAttributes;
    const out: DocWords = [];
    const addField = (field: string, value: unknown) => {
      if (value === undefined) return;
      const words: string[] = [];
      for (const text of textValues(value)) for (const word of tokenize(text)) words.push(word);
      if (words.length) out.push([field, words]);
    };
    if (list.includes('*')) for (const [field, value] of Object.entries(doc)) addField(field, value);
    else for (const field of list) addField(field, valueAtPath(doc, field));
    return out;
  }

  /** Rebuilds the words of every document (after searchableAttributes change). */
  reindexText(): void {
    this.text = new TextIndex();
    this.alive.forEach((id) => {
      this.text.add(id, this.wordsOf(this.docs[id] as Doc));
    });
  }

  private facetField(path: string): FieldIndex {
    let field = this.facets.get(path);
    if (!field) {
      field = new FieldIndex();
      this.facets.set(path, field);
    }
    return field;
  }

  /**
   * Whether a field's values are kept for filtering, facets and sorting: filterable or sortable
   * fields and those of custom ranking rules, as the engine indexes only those.
   */
  isFaceted(path: string): boolean {
    let faceted = this.facetedCache.get(path);
    if (faceted === undefined) {
      const { filterableAttributes, rankingRules } = this.settings;
      const rankedBy = rankingRules.flatMap((rule) => /^(.+):(asc|desc)$/.exec(rule)?.[1] ?? []);
      faceted =
        filterableAttributes.some((rule) => ruleMatches(rule, path)) || this.isSortable(path) || inAttributeList(path, rankedBy);
      this.facetedCache.set(path, faceted);
    }
    return faceted;
  }

  /** Rebuilds the facet data of every document (after the filterable, sortable or ranking settings change). */
  reindexFacets(): void {
    this.facets.clear();
    this.facetedCache.clear();
    this.alive.forEach((id) => {
      for (const [path, facts] of documentFacts(this.docs[id] as Doc))
        if (this.isFaceted(path)) this.facetField(path).add(id, facts);
    });
  }

  /** How many documents hold each top-level field. */
  fieldDistribution(): Record<string, number> {
    const out: Record<string, number> = {};
    this.alive.forEach((id) => {
      for (const key of Object.keys(this.docs[id] as Doc)) out[key] = (out[key] ?? 0) + 1;
    });
    return out;
  }

  isSortable(field: string): boolean {
    return inAttributeList(field, this.settings.sortableAttributes);
  }

  /** Every document in storage order. */
  allDocuments(): Doc[] {
    const out: Doc[] = [];
    this.alive.forEach((id) => {
      out.push(this.docs[id] as Doc);
    });
    return out;
  }
}
