// Documents as the index sees them: every field path with its numbers, strings, and whether it is
// null or empty; document ids; primary-key inference.
import { SearchFakeError } from '../errors';

export type Doc = Record<string, unknown>;

export interface FieldFacts {
  numbers: number[];
  strings: string[];
  isNull: boolean;
  isEmpty: boolean;
}

function factsAt(out: Map<string, FieldFacts>, path: string): FieldFacts {
  let facts = out.get(path);
  if (!facts) {
    facts = { numbers: [], strings: [], isNull: false, isEmpty: false };
    out.set(path, facts);
  }
  return facts;
}

function walk(value: unknown, path: string, onBaseKey: boolean, out: Map<string, FieldFacts>): void {
  if (Array.isArray(value)) {
    const facts = factsAt(out, path);
    if (value.length === 0 && onBaseKey) facts.isEmpty = true;
    for (const item of value) walk(item, path, false, out);
    return;
  }
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value);
    if (path) {
      const facts = factsAt(out, path);
      if (entries.length === 0 && onBaseKey) facts.isEmpty = true;
    }
    for (const [key, inner] of entries) walk(inner, path ? `${path}.${key}` : key, true, out);
    return;
  }
  const facts = factsAt(out, path);
  if (typeof value === 'number') {
    if (Number.isFinite(value)) facts.numbers.push(value);
  } else if (typeof value === 'string') {
    if (value === '') {
      if (onBaseKey) facts.isEmpty = true;
    } else {
      facts.strings.push(value);
    }
  } else if (typeof value === 'boolean') {
    facts.strings.push(value ? 'true' : 'false');
  } else if (value === null && onBaseKey) {
    facts.isNull = true;
  }
}

/** Every field path of a document (nested objects as dotted paths) with what it holds. */
export function documentFacts(doc: Doc): Map<string, FieldFacts> {
  const out = new Map<string, FieldFacts>();
  walk(doc, '', true, out);
  return out;
}

/** The words-bearing values under a field path (strings, numbers, booleans), in document order. */
export function textValues(value: unknown, out: string[] = []): string[] {
  if (Array.isArray(value)) for (const item of value) textValues(item, out);
  else if (value !== null && typeof value === 'object') for (const inner of Object.values(value)) textValues(inner, out);
  else if (typeof value === 'string') out.push(value);
  else if (typeof value === 'number' && Number.isFinite(value)) out.push(String(value));
  else if (typeof value === 'boolean') out.push(String(value));
  return out;
}

/** The value at a dotted path (objects only; arrays of objects collect every match). */
export function valueAtPath(doc: Doc, path: string): unknown {
  if (path in doc) return doc[path];
  const dot = path.indexOf('.');
  if (dot < 0) return undefined;
  for (let at = dot; at >= 0; at = path.indexOf('.', at + 1)) {
    const head = path.slice(0, at);
    if (!(head in doc)) continue;
    const inner = doc[head];
    const rest = path.slice(at + 1);
    if (Array.isArray(inner)) {
      const found = inner.filter((x) => x && typeof x === 'object').map((x) => valueAtPath(x as Doc, rest));
      const present = found.filter((x) => x !== undefined);
      return present.length ? present : undefined;
    }
    if (inner && typeof inner === 'object') return valueAtPath(inner as Doc, rest);
  }
  return undefined;
}

const ID_PATTERN = /^[a-zA-Z0-9_-]+$/;

/** A document id as the engine stores it (integers and [a-zA-Z0-9_-] strings up to 511 bytes). */
export function documentIdOf(value: unknown): string {
  if (typeof value === 'string' && value.length > 0 && Buffer.byteLength(value) < 512 && ID_PATTERN.test(value)) return value;
  if (typeof value === 'number' && Number.isSafeInteger(value)) return String(value);
  throw new SearchFakeError(
    'invalid_document_id',
    `Document identifier \`${JSON.stringify(value)}\` is invalid. A document identifier can be of type integer or string, only composed of alphanumeric characters (a-z A-Z 0-9), hyphens (-) and underscores (_), and can not be more than 511 bytes.`,
  );
}

/** The primary key guessed from the first document: its one field whose name ends in "id". */
export function inferPrimaryKey(first: Doc | undefined): string {
  const guesses = first ? Object.keys(first).filter((name) => name.toLowerCase().endsWith('id')) : [];
  guesses.sort();
  if (guesses.length === 1) return guesses[0] as string;
  if (guesses.length === 0) {
    throw new SearchFakeError(
      'index_primary_key_no_candidate_found',
      'The primary key inference failed as the engine did not find any field ending with `id` in its name. Please specify the primary key manually using the `primaryKey` query parameter.',
    );
  }
  throw new SearchFakeError(
    'index_primary_key_multiple_candidates_found',
    `The primary key inference failed as the engine found ${guesses.length} fields ending with \`id\` in their names: '${guesses[0]}' and '${guesses[1]}'. Please specify the primary key manually using the \`primaryKey\` query parameter.`,
  );
}

/** The id of a document under a primary key (which may be a dotted path). */
export function idOfDocument(doc: Doc, primaryKey: string): string {
  const value = primaryKey.includes('.') ? valueAtPath(doc, primaryKey) : doc[primaryKey];
  if (value === undefined) {
    throw new SearchFakeError(
      'missing_document_id',
      `Document doesn't have a \`${primaryKey}\` attribute: \`${JSON.stringify(doc)}\`.`,
    );
  }
  return documentIdOf(value);
}
