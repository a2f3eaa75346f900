// Sort criteria (`field:asc`, `field:desc`) and the order of results: relevance rules and sort keys
// in the order of the index's ranking rules. Numbers sort before strings; documents without the
// field go last either way; a document with several values sorts by its smallest (asc) or largest (desc).
import type { FieldIndex } from '../engine/field-index';
import type { SearchIndex } from '../engine/search-index';
import { SearchFakeError } from '../errors';
import type { TextRank } from './text-match';

export interface SortCriterion {
  field: string;
  ascending: boolean;
}

export function readSort(sort: string[] | null): SortCriterion[] {
  return (sort ?? []).map((text) => {
    const at = text.lastIndexOf(':');
    const direction = at < 0 ? '' : text.slice(at + 1);
    const field = at < 0 ? text : text.slice(0, at);
    if (direction !== 'asc' && direction !== 'desc') {
      throw new SearchFakeError(
        'invalid_search_sort',
        `Invalid syntax for the sort parameter: expected expression ending by \`:asc\` or \`:desc\`, found \`${text}\`.`,
      );
    }
    if (field === '_geo') {
      throw new SearchFakeError(
        'invalid_search_sort',
        "`_geo` is a reserved keyword and thus can't be used as a sort expression. Use the _geoPoint(latitude, longitude) built-in rule to sort on _geo field coordinates.",
      );
    }
    if (field.startsWith('_geo'))
      throw new SearchFakeError('invalid_search_sort', 'The local search fake does not support geo sorting.');
    return { field, ascending: direction === 'asc' };
  });
}

export function checkSortable(index: SearchIndex, criteria: SortCriterion[]): void {
  if (criteria.length === 0) return;
  for (const { field } of criteria) {
    if (index.isSortable(field)) continue;
    const sortable = [...index.settings.sortableAttributes].sort();
    const available = sortable.length
      ? `Available sortable attributes are: \`${sortable.join(', ')}\`.`
      : 'This index does not have configured sortable attributes.';
    throw new SearchFakeError(
      'invalid_search_sort',
      `Index \`${index.uid}\`: Attribute \`${field}\` is not sortable. ${available}`,
    );
  }
  if (!index.settings.rankingRules.includes('sort')) {
    throw new SearchFakeError(
      'invalid_search_sort',
      `Index \`${index.uid}\`: You must specify where \`sort\` is listed in the rankingRules setting to use the sort parameter at search time.`,
    );
  }
}

/** Per-candidate sort keys for one criterion: kind (0 number, 1 string, 2 missing) and value. */
function sortKeys(
  field: FieldIndex | undefined,
  ids: Int32Array,
  ascending: boolean,
): { kinds: Uint8Array; values: Float64Array } {
  const kinds = new Uint8Array(ids.length).fill(2);
  const values = new Float64Array(ids.length);
  if (!field) return { kinds, values };
  const rank = new Int32Array(field.keys.length);
  field.keysSorted().forEach((keyId, i) => {
    rank[keyId] = i;
  });
  for (let i = 0; i < ids.length; i += 1) {
    const id = ids[i] as number;
    const first = id < field.numFirst.length ? (field.numFirst[id] as number) : Number.NaN;
    if (!Number.isNaN(first)) {
      let v = first;
      const extra = field.numExtra.size ? field.numExtra.get(id) : undefined;
      if (extra) for (const n of extra) v = ascending ? Math.min(v, n) : Math.max(v, n);
      kinds[i] = 0;
      values[i] = v;
      continue;
    }
    const key = id < field.strFirst.length ? (field.strFirst[id] as number) : -1;
    if (key < 0) continue;
    let v = rank[key] as number;
    const extra = field.strExtra.size ? field.strExtra.get(id) : undefined;
    if (extra) for (const k of extra) v = ascending ? Math.min(v, rank[k] as number) : Math.max(v, rank[k] as number);
    kinds[i] = 1;
    values[i] = v;
  }
  return { kinds, values };
}

type Compare = (a: number, b: number) => number;

/** The comparator over candidate positions, following the ranking rules. */
export function rankingComparator(
  index: SearchIndex,
  ids: Int32Array,
  criteria: SortCriterion[],
  text: Map<number, TextRank> | null,
): Compare {
  const parts: Compare[] = [];
  const ranks = text ? Array.from(ids, (id) => text.get(id) as TextRank) : null;
  const keyed = (field: string, ascending: boolean): Compare => {
    const { kinds, values } = sortKeys(index.facets.get(field), ids, ascending);
    return (a, b) => {
      const ka = kinds[a] as number;
      const kb = kinds[b] as number;
      if (ka !== kb) return ka - kb;
      if (ka === 2) return 0;
      const d = (values[a] as number) - (values[b] as number);
      return ascending ? d : -d;
    };
  };
  for (const rule of index.settings.rankingRules) {
    if (rule === 'sort') {
      for (const c of criteria) parts.push(keyed(c.field, c.ascending));
      continue;
    }
    const custom = /^(.+):(asc|desc)$/.exec(rule);
    if (custom) {
      parts.push(keyed(custom[1] as string, custom[2] === 'asc'));
      continue;
    }
    if (!ranks) continue;
    const r = ranks;
    if (rule === 'words') parts.push((a, b) => (r[b] as TextRank).words - (r[a] as TextRank).words);
    else if (rule === 'typo') parts.push((a, b) => (r[a] as TextRank).typos - (r[b] as TextRank).typos);
    else if (rule === 'attributeRank') parts.push((a, b) => (r[a] as TextRank).attribute - (r[b] as TextRank).attribute);
    else if (rule === 'wordPosition') parts.push((a, b) => (r[a] as TextRank).position - (r[b] as TextRank).position);
    else if (rule === 'attribute') {
      parts.push(
        (a, b) =>
          (r[a] as TextRank).attribute - (r[b] as TextRank).attribute ||
          (r[a] as TextRank).position - (r[b] as TextRank).position,
      );
    } else if (rule === 'exactness') parts.push((a, b) => (r[b] as TextRank).exact - (r[a] as TextRank).exact);
  }
  return (a, b) => {
    for (const part of parts) {
      const d = part(a, b);
      if (d !== 0) return d;
    }
    return (ids[a] as number) - (ids[b] as number);
  };
}

/** The first `count` positions in order (a bounded heap when few are needed, else a full sort). */
export function topPositions(size: number, count: number, compare: Compare): number[] {
  if (count <= 0 || size === 0) return [];
  if (count * 4 >= size) {
    const all = Array.from({ length: size }, (_, i) => i);
    all.sort(compare);
    return all.slice(0, count);
  }
  const heap: number[] = [];
  const worse = (a: number, b: number) => compare(a, b) > 0;
  const up = (i: number) => {
    let at = i;
    while (at > 0) {
      const parent = (at - 1) >> 1;
      if (!worse(heap[at] as number, heap[parent] as number)) break;
      [heap[at], heap[parent]] = [heap[parent] as number, heap[at] as number];
      at = parent;
    }
  };
  const down = (i: number) => {
    let at = i;
    for (;;) {
      const l = 2 * at + 1;
      const r = l + 1;
      let worst = at;
      if (l < heap.length && worse(heap[l] as number, heap[worst] as number)) worst = l;
      if (r < heap.length && worse(heap[r] as number, heap[worst] as number)) worst = r;
      if (worst === at) return;
      [heap[at], heap[worst]] = [heap[worst] as number, heap[at] as number];
      at = worst;
    }
  };
  for (let i = 0; i < size; i += 1) {
    if (heap.length < count) {
      heap.push(i);
      up(heap.length - 1);
    } else if (compare(i, heap[0] as number) < 0) {
      heap[0] = i;
      down(0);
    }
  }
  return heap.sort(compare);
}
