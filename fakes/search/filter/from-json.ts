// The filter parameter in both forms: one expression string, or an array whose string items are
// ANDed and whose inner arrays are ORed.
import { SearchFakeError } from '../errors';
import type { FilterNode } from './ast';
import { parseFilterExpression } from './parse';
import { FilterSyntaxError } from './syntax-error';

function parseOne(expression: string, code: string): FilterNode | null {
  try {
    return parseFilterExpression(expression);
  } catch (error) {
    if (error instanceof FilterSyntaxError) throw new SearchFakeError(code, error.render());
    throw error;
  }
}

/** Reads a filter given as JSON; null when it filters nothing out. `code` names the parameter's error code. */
export function filterFromJson(value: unknown, code = 'invalid_search_filter'): FilterNode | null {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string') return parseOne(value, code);
  if (!Array.isArray(value)) {
    throw new SearchFakeError(
      code,
      `Invalid syntax for the filter parameter: \`expected String, Array, found: ${JSON.stringify(value)}\`.`,
    );
  }
  const ands: FilterNode[] = [];
  for (const item of value) {
    if (typeof item === 'string') {
      const node = parseOne(item, code);
      if (node) ands.push(node);
    } else if (Array.isArray(item)) {
      const ors: FilterNode[] = [];
      for (const inner of item) {
        if (typeof inner !== 'string') {
          throw new SearchFakeError(
            code,
            `Invalid type for filter subexpression: expected: String, found: ${JSON.stringify(inner)}.`,
          );
        }
        const node = parseOne(inner, code);
        if (node) ors.push(node);
      }
      if (ors.length === 1) ands.push(ors[0] as FilterNode);
      else if (ors.length > 1) ands.push({ kind: 'or', children: ors });
    } else {
      throw new SearchFakeError(
        code,
        `Invalid type for filter subexpression: expected: String, [String], found: ${JSON.stringify(item)}.`,
      );
    }
  }
  if (ands.length === 0) return null;
  return ands.length === 1 ? (ands[0] as FilterNode) : { kind: 'and', children: ands };
}
