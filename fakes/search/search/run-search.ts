// One search against one index: filter, text match, order, page, facets, hits.
import { TypedFastBitSet } from 'typedfastbitset';
import type { Doc } from '../engine/documents';
import type { SearchIndex } from '../engine/search-index';
import { filterDocuments } from '../filter/evaluate';
import { filterFromJson } from '../filter/from-json';
import { computeFacets } from './facets';
import type { SearchParams } from './params';
import { projectDocument } from './project';
import { readQuery } from './query-terms';
import { checkSortable, rankingComparator, readSort, topPositions } from './sort';
import { matchText } from './text-match';

export interface SearchResponse {
  hits: Doc[];
  query: string;
  processingTimeMs: number;
  limit?: number;
  offset?: number;
  estimatedTotalHits?: number;
  hitsPerPage?: number;
  page?: number;
  totalPages?: number;
  totalHits?: number;
  facetDistribution?: Record<string, Record<string, number>>;
  facetStats?: Record<string, { min: number; max: number }>;
}

export function runSearch(index: SearchIndex, params: SearchParams): SearchResponse {
  const started = performance.now();
  const filter = filterFromJson(params.filter);
  const criteria = readSort(params.sort);
  checkSortable(index, criteria);
  const filtered = filterDocuments(index, filter);

  const { settings } = index;
  const { terms, excluded } = readQuery(
    params.q ?? '',
    settings.typoTolerance,
    settings.stopWords,
    settings.prefixSearch !== 'disabled',
  );
  const text = terms.length ? matchText(index, terms, excluded, params.matchingStrategy, (id) => filtered.has(id)) : null;
  let candidates = filtered;
  if (text) {
    candidates = new TypedFastBitSet(text.keys());
  } else {
    for (const term of excluded) {
      for (const id of matchText(index, [term], [], 'last', (id) => filtered.has(id)).keys()) candidates.remove(id);
    }
  }

  const maxTotalHits = settings.pagination.maxTotalHits;
  const paged = params.page !== null || params.hitsPerPage !== null;
  let offset: number;
  let limit: number;
  if (paged) {
    const hitsPerPage = params.hitsPerPage ?? 20;
    const page = params.page ?? 1;
    [offset, limit] = page === 0 ? [0, 0] : [hitsPerPage * (page - 1), hitsPerPage];
  } else {
    [offset, limit] = [params.offset, params.limit];
  }
  offset = Math.min(offset, maxTotalHits);
  limit = Math.min(limit, maxTotalHits - offset);

  const ids = Int32Array.from(candidates.array());
  const customRules = settings.rankingRules.some((r) => /:(asc|desc)$/.test(r));
  let ordered: number[];
  if (!text && criteria.length === 0 && !customRules) {
    ordered = Array.from(ids.subarray(offset, offset + limit));
  } else {
    const compare = rankingComparator(index, ids, criteria, text);
    ordered = topPositions(ids.length, offset + limit, compare)
      .slice(offset)
      .map((p) => ids[p] as number);
  }
  const hits = ordered.map((id) =>
    projectDocument(index.docs[id] as Doc, settings.displayedAttributes, params.attributesToRetrieve),
  );

  const numberOfHits = Math.min(candidates.size(), maxTotalHits);
  const response: SearchResponse = { hits, query: params.q ?? '', processingTimeMs: 0 };
  if (paged) {
    const hitsPerPage = params.hitsPerPage ?? 20;
    response.hitsPerPage = hitsPerPage;
    response.page = params.page ?? 1;
    response.totalPages = hitsPerPage === 0 ? 0 : Math.ceil(numberOfHits / hitsPerPage);
    response.totalHits = numberOfHits;
  } else {
    response.limit = params.limit;
    response.offset = offset;
    response.estimatedTotalHits = numberOfHits;
  }
  if (params.facets) Object.assign(response, computeFacets(index, params.facets, candidates));
  response.processingTimeMs = Math.round(performance.now() - started);
  return response;
}
