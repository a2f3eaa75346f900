// Index settings: their shape, defaults, and the route of each setting.

export interface FilterRuleObject {
  attributePatterns: string[];
  features: { facetSearch: boolean; filter: { equality: boolean; comparison: boolean } };
}
export type FilterRule = string | FilterRuleObject;

export interface TypoTolerance {
  enabled: boolean;
  minWordSizeForTypos: { oneTypo: number; twoTypos: number };
  disableOnWords: string[];
  disableOnAttributes: string[];
  disableOnNumbers: boolean;
}

export interface Settings {
  displayedAttributes: string[];
  searchableAttributes: string[];
  filterableAttributes: FilterRule[];
  sortableAttributes: string[];
  rankingRules: string[];
  stopWords: string[];
  nonSeparatorTokens: string[];
  separatorTokens: string[];
  dictionary: string[];
  synonyms: Record<string, string[]>;
  distinctAttribute: string | null;
  proximityPrecision: string;
  typoTolerance: TypoTolerance;
  faceting: { maxValuesPerFacet: number; sortFacetValuesBy: Record<string, 'alpha' | 'count'> };
  pagination: { maxTotalHits: number };
  embedders: Record<string, never>;
  searchCutoffMs: number | null;
  localizedAttributes: null;
  facetSearch: boolean;
  prefixSearch: 'indexingTime' | 'disabled';
}

export const DEFAULT_RANKING_RULES = ['words', 'typo', 'proximity', 'attributeRank', 'sort', 'wordPosition', 'exactness'];

export function defaultSettings(): Settings {
  return {
    displayedAttributes: ['*'],
    searchableAttributes: ['*'],
    filterableAttributes: [],
    sortableAttributes: [],
    rankingRules: [...DEFAULT_RANKING_RULES],
    stopWords: [],
    nonSeparatorTokens: [],
    separatorTokens: [],
    dictionary: [],
    synonyms: {},
    distinctAttribute: null,
    proximityPrecision: 'byWord',
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnWords: [],
      disableOnAttributes: [],
      disableOnNumbers: false,
    },
    faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { '*': 'alpha' } },
    pagination: { maxTotalHits: 1000 },
    embedders: {},
    searchCutoffMs: null,
    localizedAttributes: null,
    facetSearch: true,
    prefixSearch: 'indexingTime',
  };
}

/** Route segment → settings key, with the HTTP method each per-setting route takes for updates. */
export const SETTING_ROUTES: Record<string, { key: keyof Settings; method: 'PUT' | 'PATCH' }> = {
  'displayed-attributes': { key: 'displayedAttributes', method: 'PUT' },
  'searchable-attributes': { key: 'searchableAttributes', method: 'PUT' },
  'filterable-attributes': { key: 'filterableAttributes', method: 'PUT' },
  'sortable-attributes': { key: 'sortableAttributes', method: 'PUT' },
  'ranking-rules': { key: 'rankingRules', method: 'PUT' },
  'stop-words': { key: 'stopWords', method: 'PUT' },
  'non-separator-tokens': { key: 'nonSeparatorTokens', method: 'PUT' },
  'separator-tokens': { key: 'separatorTokens', method: 'PUT' },
  dictionary: { key: 'dictionary', method: 'PUT' },
  synonyms: { key: 'synonyms', method: 'PUT' },
  'distinct-attribute': { key: 'distinctAttribute', method: 'PUT' },
  'proximity-precision': { key: 'proximityPrecision', method: 'PUT' },
  'typo-tolerance': { key: 'typoTolerance', method: 'PATCH' },
  faceting: { key: 'faceting', method: 'PATCH' },
  pagination: { key: 'pagination', method: 'PATCH' },
  'search-cutoff-ms': { key: 'searchCutoffMs', method: 'PUT' },
  'facet-search': { key: 'facetSearch', method: 'PUT' },
  'prefix-search': { key: 'prefixSearch', method: 'PUT' },
  embedders: { key: 'embedders', method: 'PATCH' },
  'localized-attributes': { key: 'localizedAttributes', method: 'PUT' },
};
