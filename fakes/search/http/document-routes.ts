// Documents: add or replace (POST), add or update (PUT), read, and delete by id, ids, filter or all.
import type { Doc } from '../engine/documents';
import type { SearchIndex } from '../engine/search-index';
import { describeJson, SearchFakeError } from '../errors';
import { filterDocuments } from '../filter/evaluate';
import { filterFromJson } from '../filter/from-json';
import { projectDocument } from '../search/project';
import { checkUid, indexOf } from './index-routes';
import { parseDocuments, parseJson } from './request';
import { accepted, ok, type RouteContext, route } from './routes';

function primaryKeyParam(ctx: RouteContext): string | null {
  return ctx.query.get('primaryKey');
}

async function write(ctx: RouteContext, merge: boolean) {
  const uid = checkUid(ctx.params.uid as string);
  const documents = parseDocuments(ctx.req, await ctx.body());
  return accepted(
    ctx.engine.enqueue({ type: 'documentAdditionOrUpdate', indexUid: uid, documents, primaryKey: primaryKeyParam(ctx), merge }),
  );
}

function count(name: string, value: unknown, fallback: number): number {
  if (value === undefined || value === null) return fallback;
  const n = typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 0) {
    throw new SearchFakeError(
      `invalid_document_${name}`,
      `Invalid value type at \`.${name}\`: expected a positive integer, but found ${describeJson(value)}`,
    );
  }
  return n;
}

function fieldsOf(value: unknown): string[] | null {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string') return value.split(',').map((s) => s.trim());
  if (Array.isArray(value) && value.every((v) => typeof v === 'string')) return value as string[];
  throw new SearchFakeError(
    'invalid_document_fields',
    `Invalid value type at \`.fields\`: expected an array, but found ${describeJson(value)}`,
  );
}

function browse(index: SearchIndex, options: Record<string, unknown>) {
  const offset = count('offset', options.offset, 0);
  const limit = count('limit', options.limit, 20);
  const fields = fieldsOf(options.fields);
  const node = filterFromJson(options.filter ?? null, 'invalid_document_filter');
  const kept = filterDocuments(index, node, 'invalid_document_filter');
  if (options.ids !== undefined && options.ids !== null) {
    if (!Array.isArray(options.ids))
      throw new SearchFakeError(
        'invalid_document_ids',
        `Invalid value type at \`.ids\`: expected an array, but found ${describeJson(options.ids)}`,
      );
    const wanted = new Set(options.ids.map(String));
    kept.forEach((id) => {
      if (!wanted.has(index.externalIds[id] as string)) kept.remove(id);
    });
  }
  const ids = kept.array();
  const results = ids.slice(offset, offset + limit).map((id) => projectDocument(index.docs[id] as Doc, ['*'], fields));
  return ok({ results, offset, limit, total: ids.length });
}

export const documentRoutes = [
  route('POST', '/indexes/:uid/documents', (ctx) => write(ctx, false)),
  route('PUT', '/indexes/:uid/documents', (ctx) => write(ctx, true)),
  route('DELETE', '/indexes/:uid/documents', (ctx) =>
    accepted(ctx.engine.enqueue({ type: 'documentDeletion', indexUid: checkUid(ctx.params.uid as string), clear: true })),
  ),
  route('GET', '/indexes/:uid/documents', (ctx) => browse(indexOf(ctx), Object.fromEntries(ctx.query))),
  route('POST', '/indexes/:uid/documents/fetch', async (ctx) => {
    const index = indexOf(ctx);
    const body = parseJson(await ctx.body(), false) ?? {};
    if (typeof body !== 'object' || Array.isArray(body))
      throw new SearchFakeError('bad_request', `Invalid value type: expected an object, but found ${describeJson(body)}`);
    return browse(index, body as Record<string, unknown>);
  }),
  route('POST', '/indexes/:uid/documents/delete-batch', async (ctx) => {
    const uid = checkUid(ctx.params.uid as string);
    const body = parseJson(await ctx.body(), true);
    if (!Array.isArray(body) || !body.every((id) => typeof id === 'string' || typeof id === 'number')) {
      throw new SearchFakeError(
        'bad_request',
        `Invalid value type: expected an array of document ids, but found ${describeJson(body)}`,
      );
    }
    return accepted(ctx.engine.enqueue({ type: 'documentDeletion', indexUid: uid, ids: body.map(String) }));
  }),
  route('POST', '/indexes/:uid/documents/delete', async (ctx) => {
    const uid = checkUid(ctx.params.uid as string);
    const body = parseJson(await ctx.body(), true) as Record<string, unknown>;
    if (typeof body !== 'object' || body === null || Array.isArray(body)) {
      throw new SearchFakeError('bad_request', `Invalid value type: expected an object, but found ${describeJson(body)}`);
    }
    if (body.filter === undefined || body.filter === null)
      throw new SearchFakeError('missing_document_filter', 'Missing field `filter`');
    if (!filterFromJson(body.filter, 'invalid_document_filter')) {
      throw new SearchFakeError('invalid_document_filter', 'Sending an empty filter is forbidden.');
    }
    return accepted(ctx.engine.enqueue({ type: 'documentDeletion', indexUid: uid, filter: body.filter }));
  }),
  route('GET', '/indexes/:uid/documents/:id', (ctx) => {
    const index = indexOf(ctx);
    const id = decodeURIComponent(ctx.params.id as string);
    const doc = index.getByExternal(id);
    if (!doc) throw new SearchFakeError('document_not_found', `Document \`${id}\` not found.`);
    return ok(projectDocument(doc, ['*'], fieldsOf(ctx.query.get('fields'))));
  }),
  route('DELETE', '/indexes/:uid/documents/:id', (ctx) =>
    accepted(
      ctx.engine.enqueue({
        type: 'documentDeletion',
        indexUid: checkUid(ctx.params.uid as string),
        ids: [decodeURIComponent(ctx.params.id as string)],
      }),
    ),
  ),
];
