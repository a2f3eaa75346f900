// Which attributes of a document a hit shows: the displayed attributes, narrowed by attributesToRetrieve.
import { isFacetedBy } from '../engine/attribute-patterns';
import type { Doc } from '../engine/documents';

function pick(value: unknown, selectors: string[], prefix: string): unknown {
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) return value.map((item) => pick(item, selectors, prefix));
  const out: Doc = {};
  for (const [key, inner] of Object.entries(value)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (selectors.some((s) => s === '*' || isFacetedBy(path, s))) out[key] = inner;
    else if (selectors.some((s) => isFacetedBy(s, path)) && inner !== null && typeof inner === 'object') {
      out[key] = pick(inner, selectors, path);
    }
  }
  return out;
}

export function projectDocument(doc: Doc, displayed: string[], retrieve: string[] | null): Doc {
  let out = displayed.includes('*') ? doc : (pick(doc, displayed, '') as Doc);
  if (retrieve && !retrieve.includes('*')) out = pick(out, retrieve, '') as Doc;
  return out;
}
