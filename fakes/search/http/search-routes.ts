// Search (POST and GET), multi-search and facet-value search.
import { TypedFastBitSet } from 'typedfastbitset';
import { isFilterable, matchingRule } from '../engine/attribute-patterns';
import type { Engine } from '../engine/engine';
import { describeJson, indexNotFound, SearchFakeError } from '../errors';
import { filterDocuments } from '../filter/evaluate';
import { filterFromJson } from '../filter/from-json';
import { readSearchBody, readSearchQuery } from '../search/params';
import { readQuery } from '../search/query-terms';
import { runSearch } from '../search/run-search';
import { matchText } from '../search/text-match';
import { normalizeFacet, tokenize } from '../text/normalize';
import { checkUid, indexOf } from './index-routes';
import { parseJson } from './request';
import { ok, route } from './routes';

function multiSearch(engine: Engine, body: unknown) {
  if (typeof body !== 'object' || body === null || !Array.isArray((body as { queries?: unknown }).queries)) {
    throw new SearchFakeError(
      'bad_request',
      `Invalid value type at \`.queries\`: expected an array, but found ${describeJson((body as { queries?: unknown })?.queries)}`,
    );
  }
  if ((body as { federation?: unknown }).federation != null) {
    throw new SearchFakeError('bad_request', 'The local search fake does not support federated multi-search.');
  }
  const queries = (body as { queries: unknown[] }).queries;
  return {
    results: queries.map((query, i) => {
      try {
        const { indexUid, ...params } = (query ?? {}) as Record<string, unknown>;
        if (typeof indexUid !== 'string') throw new SearchFakeError('invalid_index_uid', 'Missing field `indexUid`');
        const index = engine.indexes.get(checkUid(indexUid));
        if (!index) throw indexNotFound(indexUid);
        return { indexUid, ...runSearch(index, readSearchBody(params)) };
      } catch (error) {
        if (error instanceof SearchFakeError)
          throw new SearchFakeError(error.code, `Inside \`.queries[${i}]\`: ${error.message}`);
        throw error;
      }
    }),
  };
}

export const searchRoutes = [
  route('POST', '/indexes/:uid/search', async (ctx) => {
    const index = indexOf(ctx);
    const body = parseJson(await ctx.body(), false) ?? {};
    return ok(runSearch(index, readSearchBody(body)));
  }),
  route('GET', '/indexes/:uid/search', (ctx) => ok(runSearch(indexOf(ctx), readSearchQuery(ctx.query)))),
  route('POST', '/multi-search', async (ctx) => ok(multiSearch(ctx.engine, parseJson(await ctx.body(), true)))),
  route('POST', '/indexes/:uid/facet-search', async (ctx) => {
    const started = performance.now();
    const index = indexOf(ctx);
    const body = (parseJson(await ctx.body(), true) ?? {}) as Record<string, unknown>;
    const facetName = body.facetName;
    if (typeof facetName !== 'string') {
      throw new SearchFakeError('invalid_facet_search_facet_name', 'Missing field `facetName`');
    }
    const rule = matchingRule(facetName, index.settings.filterableAttributes);
    if (!isFilterable(rule?.features) || !rule?.features.facetSearch || !index.settings.facetSearch) {
      throw new SearchFakeError(
        'invalid_facet_search_facet_name',
        `Attribute \`${facetName}\` is not facet-searchable. To make it facet-searchable add it to the \`filterableAttributes\` index settings.`,
      );
    }
    const facetQuery = typeof body.facetQuery === 'string' ? body.facetQuery : null;
    const filtered = filterDocuments(index, filterFromJson(body.filter ?? null));
    let candidates = filtered;
    if (typeof body.q === 'string' && body.q.trim()) {
      const { terms, excluded } = readQuery(body.q, index.settings.typoTolerance, index.settings.stopWords, true);
      if (terms.length)
        candidates = new TypedFastBitSet(matchText(index, terms, excluded, 'last', (id) => filtered.has(id)).keys());
    }
    const field = index.facets.get(facetName);
    const wanted = facetQuery === null ? [] : tokenize(facetQuery);
    const facetHits: Array<{ value: string; count: number }> = [];
    if (field) {
      for (const keyId of field.keysSorted()) {
        const key = field.keys[keyId];
        if (!key || key.posting.size === 0) continue;
        const words = tokenize(key.normalized);
        const matches = wanted.every((w, i) =>
          i === wanted.length - 1 ? words.some((x) => x.startsWith(w)) : words.includes(w),
        );
        if (!matches && normalizeFacet(facetQuery ?? '') !== key.normalized) continue;
        const count = key.posting.countIn(candidates);
        if (count > 0) facetHits.push({ value: field.displayOf(keyId), count });
      }
    }
    facetHits.sort((a, b) => b.count - a.count);
    return ok({ facetHits: facetHits.slice(0, 100), facetQuery, processingTimeMs: Math.round(performance.now() - started) });
  }),
];
