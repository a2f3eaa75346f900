// Indexes, health, version and stats.
import type { SearchIndex } from '../engine/search-index';
import { describeJson, indexNotFound, SearchFakeError } from '../errors';
import { parseJson } from './request';
import { accepted, ok, type RouteContext, route } from './routes';

const UID = /^[a-zA-Z0-9_-]{1,400}$/;

export function checkUid(uid: string): string {
  if (!UID.test(uid)) {
    throw new SearchFakeError(
      'invalid_index_uid',
      `\`${uid}\` is not a valid index uid. Index uid can be an integer or a string containing only alphanumeric characters, hyphens (-) and underscores (_), and can not be more than 400 bytes.`,
    );
  }
  return uid;
}

export function indexOf(ctx: RouteContext): SearchIndex {
  const uid = checkUid(ctx.params.uid as string);
  const index = ctx.engine.indexes.get(uid);
  if (!index) throw indexNotFound(uid);
  return index;
}

const view = (index: SearchIndex) => ({
  uid: index.uid,
  primaryKey: index.primaryKey,
  createdAt: index.createdAt,
  updatedAt: index.updatedAt,
});

function readCount(query: URLSearchParams, name: string, fallback: number, code: string): number {
  const raw = query.get(name);
  if (raw === null) return fallback;
  if (!/^\d+$/.test(raw))
    throw new SearchFakeError(code, `Invalid value in parameter \`${name}\`: could not parse \`${raw}\` as a positive integer`);
  return Number(raw);
}

function primaryKeyOf(body: Record<string, unknown>): string | null {
  const key = body.primaryKey;
  if (key === undefined || key === null) return null;
  if (typeof key !== 'string') {
    throw new SearchFakeError(
      'invalid_index_primary_key',
      `Invalid value type at \`.primaryKey\`: expected a string, but found ${describeJson(key)}`,
    );
  }
  return key;
}

async function objectBody(ctx: RouteContext): Promise<Record<string, unknown>> {
  const body = parseJson(await ctx.body(), true);
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new SearchFakeError('bad_request', `Invalid value type: expected an object, but found ${describeJson(body)}`);
  }
  return body as Record<string, unknown>;
}

function statsOf(index: SearchIndex) {
  return { numberOfDocuments: index.documentCount, isIndexing: false, fieldDistribution: index.fieldDistribution() };
}

export const indexRoutes = [
  route('GET', '/health', () => ok({ status: 'available' })),
  route('GET', '/version', () => ok({ commitSha: 'local-fake', commitDate: 'unknown', pkgVersion: 'claybank-search-fake' })),
  route('GET', '/stats', (ctx) => {
    const indexes: Record<string, unknown> = {};
    let lastUpdate: string | null = null;
    for (const index of ctx.engine.indexes.values()) {
      indexes[index.uid] = statsOf(index);
      if (!lastUpdate || index.updatedAt > lastUpdate) lastUpdate = index.updatedAt;
    }
    return ok({ databaseSize: 0, lastUpdate, indexes });
  }),
  route('GET', '/indexes', (ctx) => {
    const offset = readCount(ctx.query, 'offset', 0, 'invalid_index_offset');
    const limit = readCount(ctx.query, 'limit', 20, 'invalid_index_limit');
    const all = [...ctx.engine.indexes.values()].sort((a, b) => (a.uid < b.uid ? -1 : 1));
    return ok({ results: all.slice(offset, offset + limit).map(view), offset, limit, total: all.length });
  }),
  route('POST', '/indexes', async (ctx) => {
    const body = await objectBody(ctx);
    if (typeof body.uid !== 'string') {
      throw new SearchFakeError(
        'invalid_index_uid',
        body.uid === undefined
          ? 'Missing field `uid`'
          : `Invalid value type at \`.uid\`: expected a string, but found ${describeJson(body.uid)}`,
      );
    }
    const uid = checkUid(body.uid);
    return accepted(ctx.engine.enqueue({ type: 'indexCreation', indexUid: uid, primaryKey: primaryKeyOf(body) }));
  }),
  route('GET', '/indexes/:uid', (ctx) => ok(view(indexOf(ctx)))),
  route('GET', '/indexes/:uid/stats', (ctx) => ok(statsOf(indexOf(ctx)))),
  route('PATCH', '/indexes/:uid', async (ctx) => {
    const uid = checkUid(ctx.params.uid as string);
    const body = await objectBody(ctx);
    const extra = Object.keys(body).find((k) => k !== 'primaryKey');
    if (extra)
      throw new SearchFakeError(
        'bad_request',
        `The local search fake can only change \`primaryKey\` of an index, not \`${extra}\`.`,
      );
    return accepted(ctx.engine.enqueue({ type: 'indexUpdate', indexUid: uid, primaryKey: primaryKeyOf(body) }));
  }),
  route('DELETE', '/indexes/:uid', (ctx) =>
    accepted(ctx.engine.enqueue({ type: 'indexDeletion', indexUid: checkUid(ctx.params.uid as string) })),
  ),
];
