// The search request: reads and checks the POST body or GET query into one shape.
import { describeJson, SearchFakeError } from '../errors';

export type MatchingStrategy = 'last' | 'all' | 'frequency';

export interface SearchParams {
  q: string | null;
  filter: unknown;
  facets: string[] | null;
  sort: string[] | null;
  limit: number;
  offset: number;
  page: number | null;
  hitsPerPage: number | null;
  attributesToRetrieve: string[] | null;
  matchingStrategy: MatchingStrategy;
}

const SUPPORTED = [
  'q',
  'filter',
  'facets',
  'sort',
  'limit',
  'offset',
  'page',
  'hitsPerPage',
  'attributesToRetrieve',
  'matchingStrategy',
];
/** Accepted and without effect here (they only shape highlighting or cropping, which is off). */
const INERT = ['cropLength', 'cropMarker', 'highlightPreTag', 'highlightPostTag', 'showPerformanceDetails', 'locales'];
/** Accepted only at their "off" value: anything else would change results in ways the fake cannot. */
const OFF_ONLY: Record<string, (v: unknown) => boolean> = {
  attributesToHighlight: (v) => v === null || (Array.isArray(v) && v.length === 0),
  attributesToCrop: (v) => v === null || (Array.isArray(v) && v.length === 0),
  attributesToSearchOn: (v) => v === null || (Array.isArray(v) && v.includes('*')),
  showMatchesPosition: (v) => v === false || v === null,
  showRankingScore: (v) => v === false || v === null,
  showRankingScoreDetails: (v) => v === false || v === null,
  rankingScoreThreshold: (v) => v === null,
  distinct: (v) => v === null,
  vector: (v) => v === null,
  hybrid: (v) => v === null,
  media: (v) => v === null,
  personalize: (v) => v === null,
  retrieveVectors: (v) => v === false || v === null,
  useNetwork: (v) => v === false || v === null,
};
const ALL_FIELDS = [...SUPPORTED, ...INERT, ...Object.keys(OFF_ONLY)];

const SNAKE = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const codeFor = (name: string) => `invalid_search_${SNAKE(name)}`;

function typeError(name: string, expected: string, value: unknown): SearchFakeError {
  return new SearchFakeError(
    codeFor(name),
    `Invalid value type at \`.${name}\`: expected ${expected}, but found ${describeJson(value)}`,
  );
}

function count(name: string, value: unknown, fallback: number): number {
  if (value === undefined) return fallback;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 0) throw typeError(name, 'a positive integer', value);
  return value;
}

function optionalCount(name: string, value: unknown): number | null {
  if (value === undefined || value === null) return null;
  return count(name, value, 0);
}

function stringArray(name: string, value: unknown): string[] | null {
  if (value === undefined || value === null) return null;
  if (!Array.isArray(value)) throw typeError(name, 'an array', value);
  value.forEach((item, i) => {
    if (typeof item !== 'string') {
      throw new SearchFakeError(
        codeFor(name),
        `Invalid value type at \`.${name}[${i}]\`: expected a string, but found ${describeJson(item)}`,
      );
    }
  });
  return value as string[];
}

/** Reads a JSON search body. `path` prefixes error locations inside multi-search. */
export function readSearchBody(body: unknown): SearchParams {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new SearchFakeError('bad_request', `Invalid value type: expected an object, but found ${describeJson(body)}`);
  }
  const input = body as Record<string, unknown>;
  for (const [name, value] of Object.entries(input)) {
    if (!ALL_FIELDS.includes(name)) {
      throw new SearchFakeError(
        'bad_request',
        `Unknown field \`${name}\`: expected one of ${ALL_FIELDS.map((f) => `\`${f}\``).join(', ')}`,
      );
    }
    const offOnly = OFF_ONLY[name];
    if (offOnly && !offOnly(value)) {
      throw new SearchFakeError('bad_request', `The local search fake does not support \`${name}\` (only its default value).`);
    }
  }
  const q = input.q;
  if (q !== undefined && q !== null && typeof q !== 'string') throw typeError('q', 'a string', q);
  const strategy = input.matchingStrategy ?? 'last';
  if (typeof strategy !== 'string') throw typeError('matchingStrategy', 'a string', strategy);
  if (!['last', 'all', 'frequency'].includes(strategy)) {
    throw new SearchFakeError(
      'invalid_search_matching_strategy',
      `Unknown value \`${strategy}\` at \`.matchingStrategy\`: expected one of \`last\`, \`all\`, \`frequency\``,
    );
  }
  return {
    q: (q as string | null | undefined) ?? null,
    filter: input.filter ?? null,
    facets: stringArray('facets', input.facets),
    sort: stringArray('sort', input.sort),
    limit: count('limit', input.limit, 20),
    offset: count('offset', input.offset, 0),
    page: optionalCount('page', input.page),
    hitsPerPage: optionalCount('hitsPerPage', input.hitsPerPage),
    attributesToRetrieve: stringArray('attributesToRetrieve', input.attributesToRetrieve),
    matchingStrategy: strategy as MatchingStrategy,
  };
}

function queryCount(name: string, raw: string): number {
  if (!/^\d+$/.test(raw)) {
    throw new SearchFakeError(
      codeFor(name),
      `Invalid value in parameter \`${name}\`: could not parse \`${raw}\` as a positive integer`,
    );
  }
  return Number(raw);
}

/** Reads the query string of GET /indexes/:uid/search (lists comma-separated, filter a string). */
export function readSearchQuery(query: URLSearchParams): SearchParams {
  const body: Record<string, unknown> = {};
  for (const [name, raw] of query) {
    if (['limit', 'offset', 'page', 'hitsPerPage'].includes(name)) body[name] = queryCount(name, raw);
    else if (
      ['facets', 'sort', 'attributesToRetrieve', 'attributesToHighlight', 'attributesToCrop', 'attributesToSearchOn'].includes(
        name,
      )
    ) {
      body[name] = raw === '' ? [] : raw.split(',').map((s) => s.trim());
    } else if (['showMatchesPosition', 'showRankingScore', 'showRankingScoreDetails', 'retrieveVectors'].includes(name)) {
      if (raw !== 'true' && raw !== 'false') {
        throw new SearchFakeError(
          codeFor(name),
          `Invalid value in parameter \`${name}\`: could not parse \`${raw}\` as a boolean, expected either \`true\` or \`false\``,
        );
      }
      body[name] = raw === 'true';
    } else if (name === 'matchingStrategy' && !['last', 'all', 'frequency'].includes(raw)) {
      throw new SearchFakeError(
        'invalid_search_matching_strategy',
        `Unknown value \`${raw}\` for parameter \`matchingStrategy\`: expected one of \`last\`, \`all\`, \`frequency\``,
      );
    } else {
      body[name] = raw;
    }
  }
  return readSearchBody(body);
}
