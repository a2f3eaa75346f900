// Property: for random documents and random filter expressions (string and array forms), the fake
// keeps exactly the documents a plain reading of the documented semantics keeps. The reference
// below evaluates each document on its own, with no index (semantics: Meilisearch docs, "Filter
// expression syntax" and "Filter and facet behaviour": = is case-insensitive after NFKD; != and
// NOT include documents without the field; a numeric bound also ranges over string values;
// arrays match on any element; EXISTS counts null; IS EMPTY means "", [] or {}). One engine detail
// comes from its source rather than its docs: a condition on a field no document of the index has
// ever had keeps nothing, so `f != x` is empty there while `NOT f = x` keeps everything
// (meilisearch crates/milli/src/search/facet/filter: an unknown field id yields an empty set).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SearchIndex } from '../../../fakes/search/engine/search-index';
import { filterDocuments } from '../../../fakes/search/filter/evaluate';
import { filterFromJson } from '../../../fakes/search/filter/from-json';

type Value = string | number | boolean | null | Value[] | Record<string, never>;
type Doc = { id: number } & Record<string, Value | undefined>;

type Leaf =
  | { op: '=' | '!=' | '>' | '>=' | '<' | '<='; field: string; value: string }
  | { op: 'TO'; field: string; from: string; to: string }
  | { op: 'IN' | 'NOT IN'; field: string; values: string[] }
  | { op: 'EXISTS' | 'NOT EXISTS' | 'IS NULL' | 'IS NOT NULL' | 'IS EMPTY' | 'IS NOT EMPTY'; field: string };
type Expr =
  | { kind: 'leaf'; leaf: Leaf }
  | { kind: 'and'; children: Expr[] }
  | { kind: 'or'; children: Expr[] }
  | { kind: 'not'; child: Expr };

const FIELDS = ['s', 'n', 'a', 'e', 'never'];
const TEXTS = ['clay', 'Clay', 'CLAY ', 'silt', 'péat', 'peat', 'sand', '10', '2.5', 'zz', 'a b'];
const NUMBERS = [-1, 0, 2.5, 3, 10, 12.75];
const FILTER_VALUES = [
  'clay',
  'CLAY',
  'silt',
  'péat',
  'peat',
  'sand',
  'a b',
  '10',
  '2.5',
  '3',
  '-1',
  '0',
  '12.75',
  'true',
  'm',
  'zz',
];

const scalar = fc.oneof(fc.constantFrom(...TEXTS), fc.constantFrom(...NUMBERS), fc.boolean());
const fieldValue: fc.Arbitrary<Value | undefined> = fc.oneof(
  { weight: 4, arbitrary: scalar },
  { weight: 2, arbitrary: fc.array(scalar, { maxLength: 3 }) },
  { weight: 1, arbitrary: fc.constantFrom<Value | undefined>(null, '', [], {}, undefined) },
);
const docs = fc
  .array(fc.record({ s: fieldValue, n: fieldValue, a: fieldValue, e: fieldValue }), { minLength: 1, maxLength: 30 })
  .map((list) =>
    list.map((d, i) => {
      const doc: Doc = { id: i + 1 };
      for (const [k, v] of Object.entries(d)) if (v !== undefined) doc[k] = v;
      return doc;
    }),
  );

const field = fc.constantFrom(...FIELDS);
const value = fc.constantFrom(...FILTER_VALUES);
const leaf: fc.Arbitrary<Leaf> = fc.oneof(
  fc.record({ op: fc.constantFrom('=', '!=', '>', '>=', '<', '<=' as const), field, value }),
  fc.record({ op: fc.constant('TO' as const), field, from: value, to: value }),
  fc.record({ op: fc.constantFrom('IN', 'NOT IN' as const), field, values: fc.array(value, { minLength: 1, maxLength: 3 }) }),
  fc.record({
    op: fc.constantFrom('EXISTS', 'NOT EXISTS', 'IS NULL', 'IS NOT NULL', 'IS EMPTY', 'IS NOT EMPTY' as const),
    field,
  }),
);
const { expr } = fc.letrec<{ expr: Expr }>((tie) => ({
  expr: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.record({ kind: fc.constant('leaf' as const), leaf }),
    fc
      .record({ kind: fc.constantFrom('and', 'or' as const), children: fc.array(tie('expr'), { minLength: 2, maxLength: 3 }) })
      .map((node) => node as Expr),
    fc.record({ kind: fc.constant('not' as const), child: tie('expr') }),
  ),
}));

// ---- rendering -------------------------------------------------------------------------------
const KEYWORDS = new Set(['AND', 'OR', 'IN', 'NOT', 'TO', 'EXISTS', 'IS', 'NULL', 'EMPTY', 'CONTAINS', 'STARTS', 'WITH']);
function renderValue(v: string, quoteStyle: number): string {
  const bare = /^[A-Za-z0-9_.-]+$/.test(v) && !KEYWORDS.has(v);
  if (bare && quoteStyle === 0) return v;
  return quoteStyle === 2 ? `'${v}'` : `"${v}"`;
}
function renderLeaf(l: Leaf, q: number): string {
  switch (l.op) {
    case 'TO':
      return `${l.field} ${renderValue(l.from, q)} TO ${renderValue(l.to, q)}`;
    case 'IN':
    case 'NOT IN':
      return `${l.field} ${l.op} [${l.values.map((v) => renderValue(v, q)).join(', ')}]`;
    case 'EXISTS':
    case 'NOT EXISTS':
    case 'IS NULL':
    case 'IS NOT NULL':
    case 'IS EMPTY':
    case 'IS NOT EMPTY':
      return `${l.field} ${l.op}`;
    default:
      return `${l.field} ${l.op} ${renderValue(l.value, q)}`;
  }
}
function render(e: Expr, q: number): string {
  if (e.kind === 'leaf') return renderLeaf(e.leaf, q);
  if (e.kind === 'not') return `NOT ${e.child.kind === 'leaf' ? render(e.child, q) : `(${render(e.child, q)})`}`;
  const joiner = e.kind === 'and' ? ' AND ' : ' OR ';
  return e.children.map((c) => (c.kind === 'and' || c.kind === 'or' ? `(${render(c, q)})` : render(c, q))).join(joiner);
}
/** The array form: top-level AND as items, an OR of leaves as an inner array. */
function renderArray(e: Expr, q: number): Array<string | string[]> {
  const items = e.kind === 'and' ? e.children : [e];
  return items.map((c) =>
    c.kind === 'or' && c.children.every((x) => x.kind === 'leaf') ? c.children.map((x) => render(x, q)) : render(c, q),
  );
}

// ---- reference semantics -------------------------------------------------------------------
const norm = (s: string) => s.trim().normalize('NFKD').toLowerCase();
const asNumber = (s: string) => (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s) ? Number(s) : null);
function cmp(a: string, b: string): number {
  const x = Array.from(a, (c) => c.codePointAt(0) as number);
  const y = Array.from(b, (c) => c.codePointAt(0) as number);
  for (let i = 0; i < Math.min(x.length, y.length); i += 1) if (x[i] !== y[i]) return (x[i] as number) - (y[i] as number);
  return x.length - y.length;
}
function facts(doc: Doc, name: string) {
  const present = name in doc;
  const v = doc[name];
  const strings: string[] = [];
  const numbers: number[] = [];
  const visit = (x: Value) => {
    if (Array.isArray(x)) x.forEach(visit);
    else if (typeof x === 'number') numbers.push(x);
    else if (typeof x === 'string' && x !== '') strings.push(norm(x));
    else if (typeof x === 'boolean') strings.push(String(x));
  };
  if (present && v !== undefined) visit(v);
  const isEmpty =
    v === '' ||
    (Array.isArray(v) && v.length === 0) ||
    (v !== null && typeof v === 'object' && !Array.isArray(v) && Object.keys(v).length === 0);
  return { present, isNull: present && v === null, isEmpty, strings, numbers };
}
function equals(doc: Doc, name: string, raw: string): boolean {
  const f = facts(doc, name);
  const n = asNumber(raw);
  return f.strings.includes(norm(raw)) || (n !== null && f.numbers.includes(n));
}
function inRange(doc: Doc, name: string, lo: [string, boolean] | null, hi: [string, boolean] | null): boolean {
  const f = facts(doc, name);
  const numeric = (lo === null || asNumber(lo[0]) !== null) && (hi === null || asNumber(hi[0]) !== null);
  const numberHit =
    numeric &&
    f.numbers.some((x) => {
      if (lo && (x < (asNumber(lo[0]) as number) || (!lo[1] && x === asNumber(lo[0])))) return false;
      if (hi && (x > (asNumber(hi[0]) as number) || (!hi[1] && x === asNumber(hi[0])))) return false;
      return true;
    });
  const stringHit = f.strings.some((s) => {
    if (lo && (cmp(s, norm(lo[0])) < 0 || (!lo[1] && cmp(s, norm(lo[0])) === 0))) return false;
    if (hi && (cmp(s, norm(hi[0])) > 0 || (!hi[1] && cmp(s, norm(hi[0])) === 0))) return false;
    return true;
  });
  return numberHit || stringHit;
}
function holds(doc: Doc, e: Expr, known: Set<string>): boolean {
  if (e.kind === 'and') return e.children.every((c) => holds(doc, c, known));
  if (e.kind === 'or') return e.children.some((c) => holds(doc, c, known));
  if (e.kind === 'not') return !holds(doc, e.child, known);
  const l = e.leaf;
  const f = facts(doc, l.field);
  switch (l.op) {
    case '=':
      return equals(doc, l.field, l.value);
    case '!=':
      return known.has(l.field) && !equals(doc, l.field, l.value);
    case '>':
      return inRange(doc, l.field, [l.value, false], null);
    case '>=':
      return inRange(doc, l.field, [l.value, true], null);
    case '<':
      return inRange(doc, l.field, null, [l.value, false]);
    case '<=':
      return inRange(doc, l.field, null, [l.value, true]);
    case 'TO':
      return inRange(doc, l.field, [l.from, true], [l.to, true]);
    case 'IN':
      return l.values.some((v) => equals(doc, l.field, v));
    case 'NOT IN':
      return !l.values.some((v) => equals(doc, l.field, v));
    case 'EXISTS':
      return f.present;
    case 'NOT EXISTS':
      return !f.present;
    case 'IS NULL':
      return f.isNull;
    case 'IS NOT NULL':
      return !f.isNull;
    case 'IS EMPTY':
      return f.isEmpty;
    case 'IS NOT EMPTY':
      return !f.isEmpty;
  }
}

function knownFields(list: Doc[]): Set<string> {
  return new Set(list.flatMap((d) => Object.keys(d)));
}

function fakeResult(list: Doc[], filter: unknown): number[] {
  const index = new SearchIndex('property', 'id');
  index.settings.filterableAttributes = FIELDS;
  for (const doc of list) index.put(String(doc.id), doc);
  const kept = filterDocuments(index, filterFromJson(filter));
  return kept
    .array()
    .map((id) => index.docs[id]?.id as number)
    .sort((a, b) => a - b);
}

describe('the fake filters as the documented semantics say', () => {
  it('in the string form', () => {
    fc.assert(
      fc.property(docs, expr, fc.integer({ min: 0, max: 2 }), (list, e, q) => {
        const expected = list.filter((d) => holds(d, e, knownFields(list))).map((d) => d.id);
        expect(fakeResult(list, render(e, q))).toEqual(expected);
      }),
      { numRuns: 400 },
    );
  });

  it('in the array form (outer items ANDed, inner arrays ORed)', () => {
    fc.assert(
      fc.property(docs, expr, fc.integer({ min: 0, max: 2 }), (list, e, q) => {
        const expected = list.filter((d) => holds(d, e, knownFields(list))).map((d) => d.id);
        expect(fakeResult(list, renderArray(e, q))).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });

  it('after documents are replaced and deleted', () => {
    fc.assert(
      fc.property(docs, docs, expr, (first, second, e) => {
        const index = new SearchIndex('property', 'id');
        index.settings.filterableAttributes = FIELDS;
        for (const doc of first) index.put(String(doc.id), doc);
        // A search first, so the later writes update the built structures in place.
        filterDocuments(index, filterFromJson(render(e, 1)));
        for (const doc of second) index.put(String(doc.id), doc);
        for (const doc of first) if (doc.id % 3 === 0) index.delete(String(doc.id));
        const live = new Map<number, Doc>();
        for (const doc of [...first, ...second]) live.set(doc.id, doc);
        for (const doc of first) if (doc.id % 3 === 0) live.delete(doc.id);
        const expected = [...live.values()]
          .filter((d) => holds(d, e, knownFields([...first, ...second])))
          .map((d) => d.id)
          .sort((a, b) => a - b);
        const kept = filterDocuments(index, filterFromJson(render(e, 0)));
        expect(
          kept
            .array()
            .map((id) => index.docs[id]?.id as number)
            .sort((a, b) => a - b),
        ).toEqual(expected);
      }),
      { numRuns: 200 },
    );
  });
});
