import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';

const pagesDir = join(import.meta.dirname, '../../../src/pages');

export const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'] as const;

/** How a route reads its body: the one JSON reader, a multipart upload, no body at all, or a partner upload. */
export type BodyKind = 'json' | 'multipart' | 'none' | 'partner' | 'catch-all';

/** Routes that read their body in their own way (everything else is recognised by the reader it calls). */
const OWN_READERS: Record<string, BodyKind> = {
  'POST /api/partner/submissions': 'partner',
  'POST /api/preferences/unit-system': 'json',
};

/** `/api/firm/members/:memberId` → the endpoint file under src/pages. */
function endpointFile(pattern: string): string {
  const path = pattern
    .replace(/:(\w+)/g, '[$1]')
    .replace(/\*(\w+)/g, '[...$1]')
    .replace(/^\//, '');
  for (const candidate of [`${path}.ts`, `${path}/index.ts`]) {
    try {
      return readFileSync(join(pagesDir, candidate), 'utf8');
    } catch {}
  }
  throw new Error(`no endpoint file for ${pattern}`);
}

/**
 * The body kind of one `METHOD /pattern` from the reader its handler calls, so a new route is probed
 * the right way without a new row here. A handler that calls none of the known readers must be named
 * in OWN_READERS (the probe fails until it is).
 */
export function bodyKindOf(route: string): BodyKind {
  const [method, pattern] = route.split(' ') as [string, string];
  if (method === 'ALL') return 'catch-all';
  if (OWN_READERS[route]) return OWN_READERS[route];
  const source = endpointFile(pattern);
  const start = source.indexOf(`export const ${method} `);
  const next = source.indexOf('export const ', start + 1);
  const handler = source.slice(start, next === -1 ? undefined : next);
  if (handler.includes('readJsonBody(')) return 'json';
  if (handler.includes('readUploadRequest(')) return 'multipart';
  if (handler.includes('readEmptyBody(')) return 'none';
  throw new Error(`${route} reads its body in a way the probe does not know: name it in OWN_READERS`);
}

/** The path parameters of a pattern (`:id`, `*path`). */
export function paramsOf(pattern: string): string[] {
  return [...pattern.matchAll(/[:*](\w+)/g)].map((m) => m[1] as string);
}

/** A pattern with each parameter filled in, one of them replaced by `malformed` when given. */
export function fillPattern(pattern: string, values: Record<string, string>, malformed?: { param: string; value: string }) {
  return pattern.replace(/[:*](\w+)/g, (_, name: string) =>
    malformed?.param === name ? malformed.value : encodeURIComponent(values[name] ?? ''),
  );
}

/** JSON text nested `levels` deep inside one field. */
export function deeplyNested(field: string, levels: number): string {
  return `{"${field}":${'['.repeat(levels)}${']'.repeat(levels)}}`;
}

/** Row counts of every table (bank and auth), read as the superuser so row-level security hides nothing. */
export async function rowCounts(superUrl: string): Promise<Record<string, number>> {
  const client = new pg.Client({ connectionString: superUrl });
  await client.connect();
  try {
    const { rows: tables } = await client.query<{ name: string }>(
      `select table_name as name from information_schema.tables
        where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`,
    );
    const counts: Record<string, number> = {};
    for (const { name } of tables) {
      // Throttling counters move with every attempt by design; they are not stored data.
      if (name === 'rate_limit_bucket' || name.startsWith('kysely_migration')) continue;
      const { rows } = await client.query<{ n: string }>(`select count(*) as n from "${name}"`);
      counts[name] = Number(rows[0]?.n);
    }
    return counts;
  } finally {
    await client.end();
  }
}
