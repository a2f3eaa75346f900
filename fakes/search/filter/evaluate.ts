// Evaluates a parsed filter over an index's facet data, as sets of internal document numbers.
import { TypedFastBitSet } from 'typedfastbitset';
import { filterablePatterns, isFilterable, matchingRule } from '../engine/attribute-patterns';
import { compareText, type FieldIndex, lowerBound } from '../engine/field-index';
import type { SearchIndex } from '../engine/search-index';
import { SearchFakeError } from '../errors';
import { normalizeFacet, parseFiniteNumber } from '../text/normalize';
import { type FilterNode, fieldTokens, operatorOf, type Token } from './ast';

interface Bound {
  value: string;
  inclusive: boolean;
}

function positionSuffix(token: Token): string {
  const column = Array.from(token.source.slice(0, token.start)).length + 1;
  return `\n${column}:${column + Array.from(token.source.slice(token.start, token.start + token.length)).length} ${token.source}`;
}

/** Refuses filters on attributes that are not filterable (400, with the patterns that are). */
export function checkFilterable(node: FilterNode, index: SearchIndex, code: string): void {
  const rules = index.settings.filterableAttributes;
  for (const token of fieldTokens(node)) {
    if (isFilterable(matchingRule(token.value, rules)?.features)) continue;
    const patterns = filterablePatterns(rules);
    const available = patterns.length
      ? ` Available filterable attribute patterns are: ${patterns.map((p) => `\`${p}\``).join(', ')}.`
      : ' This index does not have configured filterable attributes.';
    throw new SearchFakeError(
      code,
      `Index \`${index.uid}\`: Attribute \`${token.value}\` is not filterable.${available}${positionSuffix(token)}`,
    );
  }
}

function operatorRefused(index: SearchIndex, node: FilterNode, field: string, ruleIndex: number, code: string): SearchFakeError {
  const rule = matchingRule(field, index.settings.filterableAttributes);
  const allowed = ['OR', 'AND', 'NOT'];
  if (rule?.features.equality) allowed.push('=', '!=', 'IN');
  if (rule?.features.comparison) allowed.push('<', '>', '<=', '>=', 'TO');
  allowed.push('IS EMPTY', 'IS NULL', 'EXISTS');
  const op = operatorOf(node);
  const family = ['=', '!=', 'IN'].includes(op)
    ? 'equality'
    : ['<', '>', '<=', '>=', 'TO'].includes(op)
      ? 'comparison'
      : 'the appropriate filter operators';
  return new SearchFakeError(
    code,
    `Index \`${index.uid}\`: Filter operator \`${op}\` is not allowed for the attribute \`${field}\`.\n  - Note: allowed operators: ${allowed.join(', ')}.\n  - Note: field \`${field}\` matched rule #${ruleIndex} in \`filterableAttributes\`\n  - Hint: enable ${family} in rule #${ruleIndex} by modifying the features.filter object\n  - Hint: prepend another rule matching \`${field}\` with appropriate filter features before rule #${ruleIndex}`,
  );
}

function equalSet(field: FieldIndex, raw: string): TypedFastBitSet {
  const out = new TypedFastBitSet();
  const keyId = field.keyId(normalizeFacet(raw));
  if (keyId !== undefined) field.keys[keyId]?.posting.addTo(out);
  const number = parseFiniteNumber(raw);
  if (number !== null) {
    const { values, ids } = field.numbersSorted();
    for (let i = lowerBound(values, number, false); i < values.length && values[i] === number; i += 1) out.add(ids[i] as number);
  }
  return out;
}

function rangeSet(field: FieldIndex, lower: Bound | null, upper: Bound | null, numeric: boolean): TypedFastBitSet {
  const out = new TypedFastBitSet();
  if (numeric) {
    const lo = lower ? (parseFiniteNumber(lower.value) as number) : Number.NEGATIVE_INFINITY;
    const hi = upper ? (parseFiniteNumber(upper.value) as number) : Number.POSITIVE_INFINITY;
    const { values, ids } = field.numbersSorted();
    const from = lowerBound(values, lo, !!lower && !lower.inclusive);
    for (let i = from; i < values.length; i += 1) {
      const v = values[i] as number;
      if (upper && (v > hi || (!upper.inclusive && v === hi))) break;
      out.add(ids[i] as number);
    }
  }
  const lowText = lower ? normalizeFacet(lower.value) : null;
  const highText = upper ? normalizeFacet(upper.value) : null;
  for (const keyId of field.keysSorted()) {
    const key = field.keys[keyId];
    if (!key) continue;
    if (lowText !== null) {
      const c = compareText(key.normalized, lowText);
      if (c < 0 || (c === 0 && !lower?.inclusive)) continue;
    }
    if (highText !== null) {
      const c = compareText(key.normalized, highText);
      if (c > 0 || (c === 0 && !upper?.inclusive)) break;
    }
    key.posting.addTo(out);
  }
  return out;
}

function leafSet(index: SearchIndex, node: Exclude<FilterNode, { kind: 'and' | 'or' | 'not' }>, code: string): TypedFastBitSet {
  const name = node.field.value;
  const rule = matchingRule(name, index.settings.filterableAttributes);
  const field = index.facets.get(name);
  if (!rule || !field) return new TypedFastBitSet();
  const needsEquality = node.kind === 'in' || (node.kind === 'compare' && (node.op === '=' || node.op === '!='));
  const needsComparison = node.kind === 'between' || (node.kind === 'compare' && !needsEquality);
  if ((needsEquality && !rule.features.equality) || (needsComparison && !rule.features.comparison)) {
    throw operatorRefused(index, node, name, rule.index, code);
  }
  switch (node.kind) {
    case 'exists':
      return field.exists.clone();
    case 'null':
      return field.nulls.clone();
    case 'empty':
      return field.empties.clone();
    case 'in': {
      const out = new TypedFastBitSet();
      for (const value of node.values) out.union(equalSet(field, value.value));
      return out;
    }
    case 'between': {
      const numeric = parseFiniteNumber(node.from.value) !== null && parseFiniteNumber(node.to.value) !== null;
      return rangeSet(field, { value: node.from.value, inclusive: true }, { value: node.to.value, inclusive: true }, numeric);
    }
    case 'startsWith': {
      const prefix = normalizeFacet(node.value.value);
      const out = new TypedFastBitSet();
      for (const key of field.keys) if (key.normalized.startsWith(prefix)) key.posting.addTo(out);
      return out;
    }
    case 'compare': {
      const raw = node.value.value;
      if (node.op === '=') return equalSet(field, raw);
      if (node.op === '!=') return index.alive.new_difference(equalSet(field, raw));
      const numeric = parseFiniteNumber(raw) !== null;
      const bound = { value: raw, inclusive: node.op === '>=' || node.op === '<=' };
      return node.op === '>' || node.op === '>=' ? rangeSet(field, bound, null, numeric) : rangeSet(field, null, bound, numeric);
    }
  }
}

function evaluate(index: SearchIndex, node: FilterNode, code: string): TypedFastBitSet {
  switch (node.kind) {
    case 'and': {
      const [first, ...rest] = node.children;
      const out = evaluate(index, first as FilterNode, code);
      for (const child of rest) {
        if (out.isEmpty()) return out;
        out.intersection(evaluate(index, child, code));
      }
      return out;
    }
    case 'or': {
      const out = new TypedFastBitSet();
      for (const child of node.children) out.union(evaluate(index, child, code));
      return out;
    }
    case 'not':
      return index.alive.new_difference(evaluate(index, node.child, code));
    default:
      return leafSet(index, node, code);
  }
}

/** The documents a filter keeps (all documents for no filter). */
export function filterDocuments(index: SearchIndex, node: FilterNode | null, code = 'invalid_search_filter'): TypedFastBitSet {
  if (!node) return index.alive.clone();
  checkFilterable(node, index, code);
  const out = evaluate(index, node, code);
  out.intersection(index.alive);
  return out;
}
