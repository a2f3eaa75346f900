// Facet counts over every matching document (not only the returned page) and min/max of numeric
// facets. Counts list numbers first, then strings; alphabetically (ascending) or by count, capped
// at maxValuesPerFacet.
import type { TypedFastBitSet } from 'typedfastbitset';
import { facetPatternAllowed, filterablePatterns, isFilterable, matchingRule, matchPattern } from '../engine/attribute-patterns';
import { compareText, type FieldIndex } from '../engine/field-index';
import type { SearchIndex } from '../engine/search-index';
import { SearchFakeError } from '../errors';
import { formatFacetNumber } from '../text/normalize';

export interface FacetResult {
  facetDistribution: Record<string, Record<string, number>>;
  facetStats: Record<string, { min: number; max: number }>;
}

function checkFacetPatterns(index: SearchIndex, patterns: string[]): void {
  const rules = index.settings.filterableAttributes;
  for (const pattern of patterns) {
    const { ok, ruleIndex } = facetPatternAllowed(pattern, rules);
    if (ok) continue;
    if (ruleIndex !== null) {
      throw new SearchFakeError(
        'invalid_search_facets',
        `Invalid facet distribution: Attribute \`${pattern}\` matched rule #${ruleIndex} in filterableAttributes, but this rule does not enable filtering.\nHint: enable filtering in rule #${ruleIndex} by modifying the features.filter object\nHint: prepend another rule matching \`${pattern}\` with appropriate filter features before rule #${ruleIndex}`,
      );
    }
    const valid = filterablePatterns(rules);
    const tail = valid.length
      ? `Available filterable attributes patterns are: \`${valid.join(', ')}\`.`
      : 'This index does not have configured filterable attributes.';
    throw new SearchFakeError(
      'invalid_search_facets',
      `Invalid facet distribution: Pattern \`${pattern}\` is not filterable. ${tail}`,
    );
  }
}

function numberCounts(field: FieldIndex, candidates: TypedFastBitSet, stopAfter: number): Array<[number, number]> {
  const { values, ids } = field.numbersSorted();
  const out: Array<[number, number]> = [];
  for (let i = 0; i < values.length; i += 1) {
    if (!candidates.has(ids[i] as number)) continue;
    const v = values[i] as number;
    const last = out[out.length - 1];
    if (last && last[0] === v) last[1] += 1;
    else {
      if (out.length >= stopAfter) break;
      out.push([v, 1]);
    }
  }
  return out;
}

function stringCounts(field: FieldIndex, candidates: TypedFastBitSet, candidateCount: number): Int32Array {
  const counts = new Int32Array(field.keys.length);
  if (field.keys.length <= 64 || field.keys.length * 8 < candidateCount) {
    field.keys.forEach((key, keyId) => {
      if (key.posting.size) counts[keyId] = key.posting.countIn(candidates);
    });
    return counts;
  }
  candidates.forEach((id) => {
    for (const keyId of field.keysOf(id)) counts[keyId] = (counts[keyId] as number) + 1;
  });
  return counts;
}

function distributionOf(field: FieldIndex, candidates: TypedFastBitSet, candidateCount: number, max: number, byCount: boolean) {
  const out: Record<string, number> = {};
  const numbers = numberCounts(field, candidates, byCount ? Number.POSITIVE_INFINITY : max);
  if (byCount) numbers.sort((a, b) => b[1] - a[1] || a[0] - b[0]);
  let taken = 0;
  for (const [value, n] of numbers) {
    if (taken >= max) return out;
    out[formatFacetNumber(value)] = n;
    taken += 1;
  }
  const counts = stringCounts(field, candidates, candidateCount);
  const keyIds = field.keysSorted().filter((k) => (counts[k] as number) > 0);
  if (byCount) keyIds.sort((a, b) => (counts[b] as number) - (counts[a] as number));
  for (const keyId of keyIds) {
    if (taken >= max) break;
    out[field.displayOf(keyId)] = counts[keyId] as number;
    taken += 1;
  }
  return out;
}

function statsOf(field: FieldIndex, candidates: TypedFastBitSet): { min: number; max: number } | null {
  const { values, ids } = field.numbersSorted();
  let lo = -1;
  for (let i = 0; i < values.length; i += 1) {
    if (candidates.has(ids[i] as number)) {
      lo = i;
      break;
    }
  }
  if (lo < 0) return null;
  for (let i = values.length - 1; i >= lo; i -= 1) {
    if (candidates.has(ids[i] as number)) return { min: values[lo] as number, max: values[i] as number };
  }
  return null;
}

export function computeFacets(index: SearchIndex, patterns: string[], candidates: TypedFastBitSet): FacetResult {
  checkFacetPatterns(index, patterns);
  const rules = index.settings.filterableAttributes;
  const { maxValuesPerFacet, sortFacetValuesBy } = index.settings.faceting;
  const candidateCount = candidates.size();
  const fields = index.fields
    .filter((name) => patterns.some((p) => matchPattern(p, name) === 'match'))
    .filter((name) => isFilterable(matchingRule(name, rules)?.features))
    .sort(compareText);
  const facetDistribution: FacetResult['facetDistribution'] = {};
  const facetStats: FacetResult['facetStats'] = {};
  for (const name of fields) {
    const field = index.facets.get(name);
    if (!field) continue;
    const byCount = (sortFacetValuesBy[name] ?? sortFacetValuesBy['*']) === 'count';
    facetDistribution[name] = distributionOf(field, candidates, candidateCount, maxValuesPerFacet, byCount);
    const stats = statsOf(field, candidates);
    if (stats) facetStats[name] = stats;
  }
  return { facetDistribution, facetStats };
}
