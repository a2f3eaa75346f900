/** A JSON Schema node as OpenAPI 3.0 writes it (only the parts the guide shows). */
export interface SchemaNode {
  $ref?: string;
  type?: string;
  format?: string;
  enum?: unknown[];
  properties?: Record<string, SchemaNode>;
  required?: string[];
  items?: SchemaNode;
  additionalProperties?: boolean | SchemaNode;
  oneOf?: SchemaNode[];
  anyOf?: SchemaNode[];
  allOf?: SchemaNode[];
  nullable?: boolean;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: boolean | number;
  exclusiveMaximum?: boolean | number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  pattern?: string;
  default?: unknown;
  description?: string;
}

/** One line of the field table: where the field sits, its type, whether it is required, and its limits. */
export interface SchemaRow {
  path: string;
  type: string;
  required: boolean;
  notes: string;
}

const MAX_DEPTH = 7;

function resolve(node: SchemaNode, components: Record<string, SchemaNode>): SchemaNode {
  if (!node.$ref) return node;
  return components[node.$ref.replace('#/components/schemas/', '')] ?? {};
}

function typeOf(node: SchemaNode): string {
  const variants = node.oneOf ?? node.anyOf;
  if (variants) return `one of ${variants.length} forms`;
  if (node.enum) return node.enum.map((v) => JSON.stringify(v)).join(' | ');
  if (node.type === 'array') return `list of ${node.items?.type ?? 'values'}`;
  const base =
    node.format === 'binary' ? 'file' : node.format ? `${node.type ?? 'value'} (${node.format})` : (node.type ?? 'value');
  return node.nullable ? `${base} or null` : base;
}

function notesOf(node: SchemaNode): string {
  const parts: string[] = [];
  const min = typeof node.exclusiveMinimum === 'number' ? node.exclusiveMinimum : node.minimum;
  const max = typeof node.exclusiveMaximum === 'number' ? node.exclusiveMaximum : node.maximum;
  if (min !== undefined) parts.push(`${node.exclusiveMinimum ? '>' : '≥'} ${min}`);
  if (max !== undefined) parts.push(`${node.exclusiveMaximum ? '<' : '≤'} ${max}`);
  if (node.minLength !== undefined) parts.push(`at least ${node.minLength} characters`);
  if (node.maxLength !== undefined) parts.push(`at most ${node.maxLength} characters`);
  if (node.minItems !== undefined) parts.push(`at least ${node.minItems} items`);
  if (node.maxItems !== undefined) parts.push(`at most ${node.maxItems} items`);
  if (node.pattern) parts.push(`matches ${node.pattern}`);
  if (node.default !== undefined) parts.push(`default ${JSON.stringify(node.default)}`);
  if (node.description) parts.push(node.description);
  return parts.join('; ');
}

/** The fields of a request schema as rows (`layers[].cc`), references resolved, variants numbered. */
export function schemaRows(root: SchemaNode, components: Record<string, SchemaNode>): SchemaRow[] {
  const rows: SchemaRow[] = [];
  const walk = (raw: SchemaNode, path: string, required: boolean, depth: number) => {
    const node = resolve(raw, components);
    if (path) rows.push({ path, type: typeOf(node), required, notes: notesOf(node) });
    if (depth >= MAX_DEPTH) return;
    const variants = node.oneOf ?? node.anyOf;
    if (variants) {
      variants.forEach((variant, index) => {
        const resolved = resolve(variant, components);
        if (resolved.properties) walk(resolved, `${path}${path ? ' ' : ''}(form ${index + 1})`, required, depth + 1);
      });
      return;
    }
    for (const part of node.allOf ?? []) walk(part, path, required, depth + 1);
    if (node.type === 'array' && node.items) {
      const items = resolve(node.items, components);
      if (items.properties || items.oneOf || items.anyOf) walk(items, `${path}[]`, true, depth + 1);
    }
    for (const [key, child] of Object.entries(node.properties ?? {})) {
      walk(child, path ? `${path}.${key}` : key, node.required?.includes(key) ?? false, depth + 1);
    }
  };
  walk(root, '', true, 0);
  return rows;
}
