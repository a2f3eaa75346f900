// The parsed form of a filter expression.

/** A field name or value as written, with where it stands in its expression (for error messages). */
export interface Token {
  value: string;
  start: number;
  length: number;
  source: string;
}

export type CompareOp = '=' | '!=' | '>' | '>=' | '<' | '<=';

export type FilterNode =
  | { kind: 'and' | 'or'; children: FilterNode[] }
  | { kind: 'not'; child: FilterNode }
  | { kind: 'in'; field: Token; values: Token[] }
  | { kind: 'compare'; field: Token; op: CompareOp; value: Token }
  | { kind: 'between'; field: Token; from: Token; to: Token }
  | { kind: 'exists' | 'null' | 'empty'; field: Token }
  | { kind: 'startsWith'; field: Token; value: Token };

/** The operator a node uses, as named in "operator not allowed" messages. */
export function operatorOf(node: FilterNode): string {
  switch (node.kind) {
    case 'compare':
      return node.op;
    case 'between':
      return 'TO';
    case 'in':
      return 'IN';
    case 'exists':
      return 'EXISTS';
    case 'null':
      return 'IS NULL';
    case 'empty':
      return 'IS EMPTY';
    case 'startsWith':
      return 'STARTS WITH';
    default:
      return node.kind.toUpperCase();
  }
}

/** Field tokens in the order the engine checks them (last condition first). */
export function fieldTokens(node: FilterNode): Token[] {
  const out: Token[] = [];
  const stack: FilterNode[] = [node];
  while (stack.length) {
    const current = stack.pop() as FilterNode;
    if (current.kind === 'and' || current.kind === 'or') stack.push(...current.children);
    else if (current.kind === 'not') stack.push(current.child);
    else if ('field' in current) out.push(current.field);
  }
  return out;
}
