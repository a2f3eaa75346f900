// Contract: what a search returns — text matching (prefix on the last word, case and accents ignored,
// typo allowance by word length: none under 5 letters, one from 5, two from 9, a first-letter typo
// counting as two; source: Meilisearch docs, "Typo tolerance" and "Prefix search"), facet counts over
// every match, numeric facet stats, sort with missing values last, both pagination modes and the
// maxTotalHits cap (source: Meilisearch docs, "Pagination" and "Known limitations").
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { idsOf, seedSoilIndex } from './support/seed';
import { type ContractTarget, SKIP_NOTE, startTarget, TARGETS, uniqueUid } from './support/targets';

const sorted = (ids: number[]) => [...ids].sort((a, b) => a - b);

describe.each(TARGETS)('search against $name', ({ name, real, skip }) => {
  describe.skipIf(skip)(`${name}${real ? SKIP_NOTE : ''}`, () => {
    let target: ContractTarget;
    const uid = uniqueUid('search');
    const capped = uniqueUid('capped');
    const index = () => target.client.index(uid);

    beforeAll(async () => {
      target = await startTarget(real);
      await seedSoilIndex(target.client, uid);
      await seedSoilIndex(target.client, capped, {
        pagination: { maxTotalHits: 5 },
        faceting: { maxValuesPerFacet: 2, sortFacetValuesBy: { tags: 'count' } },
      });
    });
    afterAll(async () => {
      await target?.client.deleteIndexIfExists(uid);
      await target?.client.deleteIndexIfExists(capped);
      await target?.close();
    });

    describe('text', () => {
      it.each([
        ['clay', [1, 2, 5, 6, 7]],
        ['clay ', [1, 2, 5, 6]],
        ['PEAT', [3]],
        ['péat', [3]],
        ['consolidaton', [8]],
        ['fibrus peat', [3]],
        ['slit', []],
        ['gibrous', []],
        ['ovreconsolidatd clay', [5]],
        ['zzzzz clay', []],
      ])('%j matches %j', async (q, expected) => {
        const result = await index().search(q, { limit: 50 });
        expect(sorted(idsOf(result.hits))).toEqual(expected);
      });

      it('drops words from the end with the default strategy, and keeps them all with "all"', async () => {
        expect(sorted(idsOf((await index().search('clay zzzzz')).hits))).toEqual([1, 2, 5, 6]);
        expect((await index().search('clay zzzzz', { matchingStrategy: 'all' })).hits).toEqual([]);
      });

      it('ranks documents matching more query words first', async () => {
        const result = await index().search('stiff clay');
        expect(idsOf(result.hits)[0]).toBe(5);
      });

      it('treats a null or empty query as a placeholder search in storage order', async () => {
        expect(idsOf((await index().search(null)).hits)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
        expect((await index().search('')).query).toBe('');
      });
    });

    describe('facets', () => {
      it('counts every matching document, not only the returned page', async () => {
        const result = await index().search(null, { facets: ['uscs', 'tags', 'depth_m'], limit: 1 });
        expect(result.hits).toHaveLength(1);
        expect(result.facetDistribution).toEqual({
          uscs: { CH: 2, CL: 2, GC: 1, ML: 1, PT: 1, SM: 1 },
          tags: { fissured: 2, loose: 1, organic: 3, shells: 1 },
          depth_m: { '1.2': 1, '4.5': 1, '6.25': 1, '9': 1, '12.5': 1, '15': 1 },
        });
        expect(result.facetStats).toEqual({ depth_m: { min: 1.2, max: 15 } });
      });

      it('counts within the filtered set and keeps numeric stats to numbers', async () => {
        const result = await index().search(null, { filter: 'uscs = CH', facets: ['uscs', 'cc'] });
        expect(result.facetDistribution).toEqual({ uscs: { CH: 2 }, cc: { '0.28': 1, '0.62': 1 } });
        expect(result.facetStats).toEqual({ cc: { min: 0.28, max: 0.62 } });
        const all = await index().search(null, { facets: ['cc'] });
        expect(all.facetDistribution?.cc?.['n/a']).toBe(1);
        expect(all.facetStats).toEqual({ cc: { min: 0.12, max: 2.4 } });
      });

      it('counts one value however it is capitalised', async () => {
        const result = await index().search(null, { filter: 'unit STARTS WITH salt', facets: ['unit'] });
        const units = Object.entries(result.facetDistribution?.unit ?? {});
        expect(units).toHaveLength(1);
        expect(units[0]?.[0].toLowerCase()).toBe('saltreach clay');
        expect(units[0]?.[1]).toBe(3);
      });

      it('caps the values per facet and orders by count when asked', async () => {
        const result = await target.client.index(capped).search(null, { facets: ['uscs', 'tags'] });
        expect(result.facetDistribution).toEqual({ uscs: { CH: 2, CL: 2 }, tags: { organic: 3, fissured: 2 } });
      });

      it('returns empty facet objects when no document matches', async () => {
        const result = await index().search(null, { filter: 'uscs = XX', facets: ['uscs'] });
        expect(result.facetDistribution).toEqual({ uscs: {} });
        expect(result.facetStats).toEqual({});
      });
    });

    describe('sort', () => {
      it.each([
        [['depth_m:asc'], [3, 1, 7, 2, 4, 5, 6, 8]],
        [['depth_m:desc'], [5, 4, 2, 7, 1, 3, 6, 8]],
        [['cc:asc'], [8, 5, 2, 7, 1, 3, 6, 4]],
        [['cc:desc'], [3, 1, 7, 2, 5, 8, 6, 4]],
        [
          ['uscs:asc', 'depth_m:desc'],
          [5, 1, 2, 8, 6, 7, 3, 4],
        ],
      ])('%j orders %j (numbers before strings, missing values last)', async (sort, expected) => {
        expect(idsOf((await index().search(null, { sort })).hits)).toEqual(expected);
      });

      it('sorts within the filtered set and pages after sorting', async () => {
        const result = await index().search(null, { filter: 'depth_m EXISTS', sort: ['depth_m:desc'], offset: 1, limit: 2 });
        expect(idsOf(result.hits)).toEqual([4, 2]);
      });
    });

    describe('pagination', () => {
      it('pages by offset and limit with an estimated total', async () => {
        const result = await index().search(null, { offset: 2, limit: 3 });
        expect(idsOf(result.hits)).toEqual([3, 4, 5]);
        expect(result).toMatchObject({ offset: 2, limit: 3, estimatedTotalHits: 8 });
        expect(result).not.toHaveProperty('totalHits');
      });

      it('pages by page and hitsPerPage with exact totals', async () => {
        const result = await index().search(null, { page: 2, hitsPerPage: 3 });
        expect(idsOf(result.hits)).toEqual([4, 5, 6]);
        expect(result).toMatchObject({ page: 2, hitsPerPage: 3, totalHits: 8, totalPages: 3 });
        expect(result).not.toHaveProperty('estimatedTotalHits');
      });

      it('answers a count only for hitsPerPage 0, and nothing past the last page or for page 0', async () => {
        expect(await index().search(null, { hitsPerPage: 0 })).toMatchObject({ hits: [], totalHits: 8, totalPages: 0 });
        expect((await index().search(null, { page: 4, hitsPerPage: 3 })).hits).toEqual([]);
        expect((await index().search(null, { page: 0 })).hits).toEqual([]);
      });

      it('never counts or returns more than maxTotalHits', async () => {
        const capIndex = target.client.index(capped);
        expect(await capIndex.search(null, { limit: 20 })).toMatchObject({ estimatedTotalHits: 5 });
        expect((await capIndex.search(null, { limit: 20 })).hits).toHaveLength(5);
        expect(idsOf((await capIndex.search(null, { offset: 4, limit: 20 })).hits)).toEqual([5]);
        expect(await capIndex.search(null, { offset: 6 })).toMatchObject({ hits: [], offset: 5 });
        const paged = await capIndex.search(null, { page: 2, hitsPerPage: 3 });
        expect(idsOf(paged.hits)).toEqual([4, 5]);
        expect(paged).toMatchObject({ totalHits: 5, totalPages: 2 });
      });
    });

    describe('attributes', () => {
      it('returns only the attributes asked for', async () => {
        const result = await index().search(null, { filter: 'uscs = PT', attributesToRetrieve: ['id', 'unit'] });
        expect(result.hits).toEqual([{ id: 3, unit: 'Marsh Peat' }]);
      });

      it('never returns attributes that are not displayed', async () => {
        const hidden = uniqueUid('displayed');
        await seedSoilIndex(target.client, hidden, { displayedAttributes: ['id', 'uscs'], filterableAttributes: ['id'] });
        try {
          const all = await target.client.index(hidden).search(null, { filter: 'id = 2' });
          expect(all.hits).toEqual([{ id: 2, uscs: 'CL' }]);
          const asked = await target.client
            .index(hidden)
            .search(null, { filter: 'id = 2', attributesToRetrieve: ['unit', 'uscs'] });
          expect(asked.hits).toEqual([{ uscs: 'CL' }]);
        } finally {
          await target.client.deleteIndexIfExists(hidden);
        }
      });
    });

    it('answers several searches at once', async () => {
      const { results } = await target.client.multiSearch({
        queries: [
          { indexUid: uid, q: 'clay', filter: 'uscs = CH' },
          { indexUid: uid, filter: 'depth_m > 10', facets: ['uscs'] },
        ],
      });
      expect(results.map((r) => sorted(idsOf(r.hits)))).toEqual([
        [1, 5],
        [4, 5],
      ]);
      expect(results[0]?.indexUid).toBe(uid);
      expect(results[1]?.facetDistribution).toEqual({ uscs: { CH: 1, SM: 1 } });
    });
  });
});
