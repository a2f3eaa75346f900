import { IMPORT_FIELDS, type ImportFieldKey } from './fields';
import { headerParts, normaliseName } from './header-text';

/**
 * Every normalised name a field answers to: its key, its label (without bracketed units) and its
 * synonyms. Built once. `collisions` lists names claimed by two fields (a test keeps it empty).
 */
function buildIndex() {
  const index = new Map<string, ImportFieldKey>();
  const collisions: string[] = [];
  for (const field of IMPORT_FIELDS) {
    const names = [field.key, headerParts(field.label).withoutUnits, ...field.synonyms];
    for (const name of names) {
      const key = normaliseName(name);
      if (key === '') continue;
      const owner = index.get(key);
      if (owner && owner !== field.key) collisions.push(`${key}: ${owner} and ${field.key}`);
      else index.set(key, field.key);
    }
  }
  return { index, collisions };
}

const built = buildIndex();

export const SYNONYM_INDEX: ReadonlyMap<string, ImportFieldKey> = built.index;
export const SYNONYM_COLLISIONS: readonly string[] = built.collisions;

/** The field a header names, trying the header without units, without any brackets, then without a last unit word. */
export function fieldForHeader(header: string): ImportFieldKey | null {
  const parts = headerParts(header);
  for (const candidate of [parts.withoutUnits, parts.bare, parts.withoutTrailingUnit]) {
    if (candidate === null) continue;
    const key = SYNONYM_INDEX.get(normaliseName(candidate));
    if (key) return key;
  }
  return null;
}
