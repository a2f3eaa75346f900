// Which settings rule an attribute falls under: exact names, nested fields ("soil" covers "soil.class"),
// and the wildcard patterns of the object form ("cv_*", "*_kpa", "*").
import type { FilterRule } from './settings';

type PatternMatch = 'match' | 'parent' | 'none';

/** True when `field` is `facet` itself or nested under it. */
export function isFacetedBy(field: string, facet: string): boolean {
  return field.startsWith(facet) && (field.length === facet.length || field[facet.length] === '.');
}

export function matchPattern(pattern: string, field: string): PatternMatch {
  if (pattern === '*') return 'match';
  if (pattern.length > 1 && pattern.startsWith('*') && pattern.endsWith('*')) {
    if (field.includes(pattern.slice(1, -1))) return 'match';
  } else if (pattern.startsWith('*')) {
    if (field.endsWith(pattern.slice(1))) return 'match';
  } else if (pattern.endsWith('*')) {
    if (field.startsWith(pattern.slice(0, -1))) return 'match';
  } else if (pattern === field) {
    return 'match';
  }
  return isFacetedBy(pattern, field) ? 'parent' : 'none';
}

/** The older rule for plain names: the field itself or anything nested under it. */
export function matchFieldLegacy(pattern: string, field: string): PatternMatch {
  if (isFacetedBy(field, pattern)) return 'match';
  if (isFacetedBy(pattern, field)) return 'parent';
  return 'none';
}

export interface FilterFeatures {
  equality: boolean;
  comparison: boolean;
  facetSearch: boolean;
}

const LEGACY: FilterFeatures = { equality: true, comparison: true, facetSearch: true };

export function ruleMatches(rule: FilterRule, field: string): boolean {
  if (typeof rule === 'string') return matchFieldLegacy(rule, field) === 'match';
  return rule.attributePatterns.some((p) => matchPattern(p, field) === 'match');
}

/** The first rule a field falls under and what it allows, or null. */
export function matchingRule(field: string, rules: FilterRule[]): { index: number; features: FilterFeatures } | null {
  for (let index = 0; index < rules.length; index += 1) {
    const rule = rules[index] as FilterRule;
    if (!ruleMatches(rule, field)) continue;
    if (typeof rule === 'string') return { index, features: LEGACY };
    return { index, features: { ...rule.features.filter, facetSearch: rule.features.facetSearch } };
  }
  return null;
}

export function isFilterable(features: FilterFeatures | undefined): boolean {
  return !!features && (features.equality || features.comparison);
}

/** The patterns that make attributes filterable, sorted (as named in error messages). */
export function filterablePatterns(rules: FilterRule[]): string[] {
  const out = new Set<string>();
  for (const rule of rules) {
    if (typeof rule === 'string') out.add(rule);
    else if (rule.features.filter.equality || rule.features.filter.comparison) for (const p of rule.attributePatterns) out.add(p);
  }
  return [...out].sort();
}

/** Whether a requested facet pattern names (or overlaps) some filterable rule. */
export function facetPatternAllowed(pattern: string, rules: FilterRule[]): { ok: boolean; ruleIndex: number | null } {
  for (let index = 0; index < rules.length; index += 1) {
    const rule = rules[index] as FilterRule;
    const filterable = typeof rule === 'string' || rule.features.filter.equality || rule.features.filter.comparison;
    const patterns = typeof rule === 'string' ? [rule] : rule.attributePatterns;
    if (filterable) {
      const overlaps = patterns.some((p) => {
        const legacy = typeof rule === 'string' && matchFieldLegacy(pattern, p) !== 'none';
        return legacy || matchPattern(pattern, p) !== 'none' || matchPattern(p, pattern) === 'match';
      });
      if (overlaps) return { ok: true, ruleIndex: index };
    } else if (patterns.some((p) => matchPattern(p, pattern) === 'match')) {
      return { ok: false, ruleIndex: index };
    }
  }
  return { ok: false, ruleIndex: null };
}

/** Whether `field` is named by a list of plain attribute names (sortable, searchable, displayed). */
export function inAttributeList(field: string, list: string[]): boolean {
  return list.some((name) => name === '*' || matchFieldLegacy(name, field) === 'match');
}
