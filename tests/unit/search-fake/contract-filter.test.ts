// Contract: the filter grammar and its meaning, checked against expected sets worked out by hand
// from the engine's documentation of each operator (Meilisearch docs, "Filter expression syntax":
// != and NOT include documents without the field; = compares case-insensitively; ranges are
// inclusive for TO; a number bound also matches strings that sort after it; arrays match on any element).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiError, idsOf, seedSoilIndex } from './support/seed';
import { ALL_IDS } from './support/soil-records';
import { type ContractTarget, SKIP_NOTE, startTarget, TARGETS, uniqueUid } from './support/targets';

const CASES: Array<[filter: string | Array<string | string[]>, expected: number[]]> = [
  ['unit = "Saltreach Clay"', [1, 2, 5]],
  ["unit = 'SALTREACH CLAY'", [1, 2, 5]],
  ['uscs = CH', [1, 5]],
  ['unit != "Saltreach Clay"', [3, 4, 6, 7, 8]],
  ['depth_m > 9', [4, 5]],
  ['depth_m >= 9', [2, 4, 5]],
  ['depth_m < 4.5', [3]],
  ['depth_m <= 4.5', [1, 3]],
  ['depth_m 4.5 TO 12.5', [1, 2, 4, 7]],
  ['depth_m 12.5 TO 4.5', []],
  ['depth_m = 9', [2]],
  ['depth_m = 9.0', [2]],
  ['cc > 0.3', [1, 2, 3, 6, 7]],
  ['cc < 0.3', [5, 8]],
  ['cc = "n/a"', [6]],
  ['cc = 0.12', [8]],
  ['uscs IN [CH, ml]', [1, 5, 7]],
  ['uscs IN [CH, ml,]', [1, 5, 7]],
  ['uscs NOT IN [CH, CL]', [3, 4, 6, 7]],
  ['tags = organic', [1, 5, 7]],
  ['tags IN [shells, loose]', [1, 4]],
  ['NOT tags = organic', [2, 3, 4, 6, 8]],
  ['tags EXISTS', [1, 2, 3, 4, 5, 7]],
  ['tags NOT EXISTS', [6, 8]],
  ['tags IS EMPTY', [3]],
  ['tags IS NOT EMPTY', [1, 2, 4, 5, 6, 7, 8]],
  ['note IS NULL', [2]],
  ['note IS NOT NULL', [1, 3, 4, 5, 6, 7, 8]],
  ['note IS EMPTY', [3, 4]],
  ['note EXISTS', [1, 2, 3, 4]],
  ['unit IS NULL', [6]],
  ['depth_m IS NULL', [6]],
  ['depth_m NOT EXISTS', [8]],
  ['unit STARTS WITH salt', [1, 2, 5]],
  ['unit NOT STARTS WITH salt', [3, 4, 6, 7, 8]],
  ['uscs = CL OR uscs = CH AND depth_m > 10', [2, 5, 8]],
  ['(uscs = CL OR uscs = CH) AND depth_m > 10', [5]],
  ['NOT (uscs = CL OR uscs = CH)', [3, 4, 6, 7]],
  ['NOT NOT uscs = CL', [2, 8]],
  ['unit = "Marsh Peat" OR unit = \'River Sand\'', [3, 4]],
  ['unit = "NOT"', []],
  ['lab = anything', []],
  ['', ALL_IDS],
  [['uscs = CH', 'depth_m < 10'], [1]],
  [
    [['uscs = CL', 'uscs = PT'], 'depth_m < 10'],
    [2, 3],
  ],
  [[['tags = loose', 'tags = shells']], [1, 4]],
  [[], ALL_IDS],
];

const SYNTAX_ERRORS = [
  'unit = ',
  'unit & clay',
  'uscs = CH XOR uscs = CL',
  'uscs IN [CH',
  'uscs IN CH',
  '(uscs = CH',
  'unit = "open quote',
  'NOT',
  'uscs = CH AND',
  'AND = 1',
];

describe.each(TARGETS)('filters against $name', ({ name, real, skip }) => {
  describe.skipIf(skip)(`${name}${real ? SKIP_NOTE : ''}`, () => {
    let target: ContractTarget;
    const uid = uniqueUid('filter');

    beforeAll(async () => {
      target = await startTarget(real);
      await seedSoilIndex(target.client, uid);
    });
    afterAll(async () => {
      await target?.client.deleteIndexIfExists(uid);
      await target?.close();
    });

    it.each(CASES)('%j keeps %j', async (filter, expected) => {
      const result = await target.client.index(uid).search(null, { filter, limit: 100 });
      expect(idsOf(result.hits).sort((a, b) => a - b)).toEqual(expected);
      expect(result.estimatedTotalHits).toBe(expected.length);
    });

    it('reads a filter given in the query string of GET search', async () => {
      const result = await target.client.index(uid).searchGet('', { filter: 'uscs IN [CH, CL] AND depth_m > 5' });
      expect(idsOf(result.hits).sort()).toEqual([2, 5]);
    });

    it.each(SYNTAX_ERRORS)('refuses %j as invalid_search_filter', async (filter) => {
      const error = await apiError(target.client.index(uid).search(null, { filter }));
      expect(error).toMatchObject({ status: 400, code: 'invalid_search_filter', type: 'invalid_request' });
    });

    it('says where the filter stops making sense', async () => {
      const error = await apiError(target.client.index(uid).search(null, { filter: 'uscs = CH XOR uscs = CL' }));
      expect(error.message).toBe(
        'Found unexpected characters at the end of the filter: `XOR uscs = CL`. You probably forgot an `OR` or an `AND` rule.\n11:24 uscs = CH XOR uscs = CL',
      );
    });

    it('refuses attributes that are not filterable and lists those that are', async () => {
      const error = await apiError(target.client.index(uid).search(null, { filter: 'description = clay' }));
      expect(error).toMatchObject({ status: 400, code: 'invalid_search_filter' });
      expect(error.message).toContain(
        'Attribute `description` is not filterable. Available filterable attribute patterns are: `cc`, `depth_m`, `lab`, `note`, `tags`, `unit`, `uscs`.',
      );
      expect(error.message).toContain('\n1:12 description = clay');
    });

    it('refuses a filter that is neither a string nor an array', async () => {
      const error = await apiError(target.client.index(uid).search(null, { filter: true as unknown as string }));
      expect(error).toMatchObject({ status: 400, code: 'invalid_search_filter' });
    });

    it('refuses comparison operators where an attribute allows only equality', async () => {
      const strict = uniqueUid('granular');
      await seedSoilIndex(target.client, strict, {
        filterableAttributes: [
          { attributePatterns: ['depth_m'], features: { facetSearch: false, filter: { equality: true, comparison: false } } },
        ],
      });
      try {
        expect(idsOf((await target.client.index(strict).search(null, { filter: 'depth_m = 9' })).hits)).toEqual([2]);
        const error = await apiError(target.client.index(strict).search(null, { filter: 'depth_m > 9' }));
        expect(error).toMatchObject({ status: 400, code: 'invalid_search_filter' });
        expect(error.message).toContain('Filter operator `>` is not allowed for the attribute `depth_m`.');
      } finally {
        await target.client.deleteIndexIfExists(strict);
      }
    });
  });
});
