// Checks the settings a client sends (the whole object or one setting) and merges them into the current ones.
import { describeJson, SearchFakeError } from '../errors';
import { defaultSettings, type FilterRule, SETTING_ROUTES, type Settings } from './settings';

const SNAKE: Record<string, string> = {};
for (const route of Object.values(SETTING_ROUTES)) {
  SNAKE[route.key] = route.key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
}

function invalid(key: string, message: string): SearchFakeError {
  return new SearchFakeError(`invalid_settings_${SNAKE[key] ?? 'faceting'}`, message);
}

function typeError(path: string, key: string, expected: string, value: unknown): SearchFakeError {
  return invalid(key, `Invalid value type at \`${path}\`: expected ${expected}, but found ${describeJson(value)}`);
}

function stringList(key: string, value: unknown, path = `.${key}`): string[] {
  if (!Array.isArray(value)) throw typeError(path, key, 'an array', value);
  value.forEach((item, i) => {
    if (typeof item !== 'string') throw typeError(`${path}[${i}]`, key, 'a string', item);
  });
  return [...new Set(value as string[])];
}

function positiveInt(key: string, path: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 0) {
    throw typeError(path, key, 'a positive integer', value);
  }
  return value;
}

function filterRules(value: unknown): FilterRule[] {
  const key = 'filterableAttributes';
  if (!Array.isArray(value)) throw typeError('.filterableAttributes', key, 'an array', value);
  return value.map((rule, i): FilterRule => {
    const path = `.filterableAttributes[${i}]`;
    if (typeof rule === 'string') return rule;
    if (typeof rule !== 'object' || rule === null || Array.isArray(rule))
      throw typeError(path, key, 'a string or an object', rule);
    const { attributePatterns, features, ...rest } = rule as Record<string, unknown>;
    const extra = Object.keys(rest)[0];
    if (extra)
      throw invalid(key, `Unknown field \`${extra}\` inside \`${path}\`: expected one of \`attributePatterns\`, \`features\``);
    const patterns = stringList(key, attributePatterns, `${path}.attributePatterns`);
    const f = (features ?? {}) as Record<string, unknown>;
    const filter = (f.filter ?? {}) as Record<string, unknown>;
    const flag = (v: unknown, fallback: boolean, at: string) => {
      if (v === undefined) return fallback;
      if (typeof v !== 'boolean') throw typeError(at, key, 'a boolean', v);
      return v;
    };
    return {
      attributePatterns: patterns,
      features: {
        facetSearch: flag(f.facetSearch, false, `${path}.features.facetSearch`),
        filter: {
          equality: flag(filter.equality, true, `${path}.features.filter.equality`),
          comparison: flag(filter.comparison, false, `${path}.features.filter.comparison`),
        },
      },
    };
  });
}

const BUILT_IN_RULES = new Set(['words', 'typo', 'proximity', 'attribute', 'attributeRank', 'sort', 'wordPosition', 'exactness']);

function rankingRules(value: unknown): string[] {
  const rules = stringList('rankingRules', value);
  for (const rule of rules) {
    if (BUILT_IN_RULES.has(rule) || /^[^:]+:(asc|desc)$/.test(rule)) continue;
    throw invalid(
      'rankingRules',
      `Invalid value at \`.rankingRules[${rules.indexOf(rule)}]\`: \`${rule}\` ranking rule is invalid. Valid ranking rules are words, typo, sort, proximity, attribute, exactness and custom ranking rules.`,
    );
  }
  return rules;
}

function unsupported(key: string, why: string): SearchFakeError {
  return new SearchFakeError('bad_request', `The local search fake does not support the \`${key}\` setting ${why}.`);
}

/** Validates one setting's new value (`null` resets it); returns the value to store. */
export function validateSetting<K extends keyof Settings>(key: K, value: unknown, current: Settings): Settings[K] {
  const defaults = defaultSettings();
  if (value === null) return defaults[key];
  const path = `.${key}`;
  switch (key) {
    case 'displayedAttributes':
    case 'searchableAttributes':
    case 'sortableAttributes':
    case 'stopWords':
      return stringList(key, value) as Settings[K];
    case 'nonSeparatorTokens':
    case 'separatorTokens':
    case 'dictionary': {
      const list = stringList(key, value);
      if (list.length) throw unsupported(key, 'with entries (its tokenizer is fixed)');
      return list as Settings[K];
    }
    case 'filterableAttributes':
      return filterRules(value) as Settings[K];
    case 'rankingRules':
      return rankingRules(value) as Settings[K];
    case 'synonyms': {
      if (typeof value !== 'object' || Array.isArray(value)) throw typeError(path, key, 'an object', value);
      if (Object.keys(value as object).length) throw unsupported(key, 'with entries');
      return {} as Settings[K];
    }
    case 'distinctAttribute':
      if (typeof value !== 'string') throw typeError(path, key, 'a string', value);
      throw unsupported(key, '(no distinct attribute can be set)');
    case 'proximityPrecision':
      if (value !== 'byWord' && value !== 'byAttribute') {
        throw invalid(
          key,
          `Unknown value \`${String(value)}\` at \`.proximityPrecision\`: expected one of \`byWord\`, \`byAttribute\``,
        );
      }
      return value as Settings[K];
    case 'searchCutoffMs':
      return positiveInt(key, path, value) as Settings[K];
    case 'facetSearch':
      if (typeof value !== 'boolean') throw typeError(path, key, 'a boolean', value);
      return value as Settings[K];
    case 'prefixSearch':
      if (value !== 'indexingTime' && value !== 'disabled') {
        throw invalid(
          key,
          `Unknown value \`${String(value)}\` at \`.prefixSearch\`: expected one of \`indexingTime\`, \`disabled\``,
        );
      }
      return value as Settings[K];
    case 'embedders':
      if (typeof value !== 'object' || Array.isArray(value)) throw typeError(path, key, 'an object', value);
      if (Object.keys(value as object).length) throw unsupported(key, 'with embedders (no vector search)');
      return {} as Settings[K];
    case 'localizedAttributes':
      throw unsupported(key, 'with rules (one tokenizer for every language)');
    case 'pagination':
      return mergeObject(key, value, current.pagination, {
        maxTotalHits: (v) => {
          const n = positiveInt(key, '.pagination.maxTotalHits', v);
          if (n === 0) throw invalid(key, 'Invalid value at `.pagination.maxTotalHits`: a value of 0 is not allowed');
          return n;
        },
      }) as Settings[K];
    case 'faceting':
      return mergeObject(key, value, current.faceting, {
        maxValuesPerFacet: (v) => positiveInt(key, '.faceting.maxValuesPerFacet', v),
        sortFacetValuesBy: (v) => {
          if (typeof v !== 'object' || v === null || Array.isArray(v)) {
            throw typeError('.faceting.sortFacetValuesBy', key, 'an object', v);
          }
          const out: Record<string, 'alpha' | 'count'> = { '*': 'alpha' };
          for (const [name, order] of Object.entries(v)) {
            if (order !== 'alpha' && order !== 'count') {
              throw invalid(
                key,
                `Unknown value \`${String(order)}\` at \`.faceting.sortFacetValuesBy.${name}\`: expected one of \`alpha\`, \`count\``,
              );
            }
            out[name] = order;
          }
          return out;
        },
      }) as Settings[K];
    case 'typoTolerance':
      return mergeObject(key, value, current.typoTolerance, {
        enabled: (v) => {
          if (typeof v !== 'boolean') throw typeError('.typoTolerance.enabled', key, 'a boolean', v);
          return v;
        },
        disableOnNumbers: (v) => {
          if (typeof v !== 'boolean') throw typeError('.typoTolerance.disableOnNumbers', key, 'a boolean', v);
          return v;
        },
        disableOnWords: (v) => stringList(key, v, '.typoTolerance.disableOnWords'),
        disableOnAttributes: (v) => {
          const list = stringList(key, v, '.typoTolerance.disableOnAttributes');
          if (list.length) throw unsupported('typoTolerance.disableOnAttributes', 'with entries');
          return list;
        },
        minWordSizeForTypos: (v) => {
          const merged = mergeObject(key, v, current.typoTolerance.minWordSizeForTypos, {
            oneTypo: (n) => positiveInt(key, '.typoTolerance.minWordSizeForTypos.oneTypo', n),
            twoTypos: (n) => positiveInt(key, '.typoTolerance.minWordSizeForTypos.twoTypos', n),
          });
          if (merged.oneTypo > merged.twoTypos || merged.twoTypos > 255) {
            throw invalid(
              key,
              `\`minWordSizeForTypos\` setting is invalid. \`oneTypo\` and \`twoTypos\` fields should be between \`0\` and \`255\`, and \`twoTypos\` should be greater or equals to \`oneTypo\` but found \`oneTypo: ${merged.oneTypo}\` and twoTypos: ${merged.twoTypos}\`.`,
            );
          }
          return merged;
        },
      }) as Settings[K];
    default:
      throw new SearchFakeError('bad_request', `Unknown setting \`${String(key)}\`.`);
  }
}

function mergeObject<T extends object>(
  key: string,
  value: unknown,
  current: T,
  fields: { [F in keyof T]: (v: unknown) => T[F] },
): T {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) throw typeError(`.${key}`, key, 'an object', value);
  const out = structuredClone(current);
  for (const [name, v] of Object.entries(value)) {
    const check = fields[name as keyof T];
    if (!check) {
      throw invalid(
        key,
        `Unknown field \`${name}\` inside \`.${key}\`: expected one of ${Object.keys(fields)
          .map((f) => `\`${f}\``)
          .join(', ')}`,
      );
    }
    if (v === null) continue;
    out[name as keyof T] = check(v);
  }
  return out;
}

const SETTING_KEYS = new Set(Object.values(SETTING_ROUTES).map((r) => r.key as string));
const IGNORED_KEYS = new Set(['chat', 'vectorStore', 'foreignKeys']);

/** Validates a whole-settings PATCH body; returns the settings after the update. */
export function mergeSettings(current: Settings, body: unknown): { next: Settings; changed: Partial<Settings> } {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new SearchFakeError('bad_request', `Invalid value type: expected an object, but found ${describeJson(body)}`);
  }
  const next = structuredClone(current);
  const changed: Partial<Settings> = {};
  for (const [key, value] of Object.entries(body)) {
    if (!SETTING_KEYS.has(key)) {
      if (IGNORED_KEYS.has(key)) throw unsupported(key, 'at all');
      throw new SearchFakeError(
        'bad_request',
        `Unknown field \`${key}\`: expected one of ${[...SETTING_KEYS].map((k) => `\`${k}\``).join(', ')}`,
      );
    }
    const typedKey = key as keyof Settings;
    const stored = validateSetting(typedKey, value, next);
    (next as unknown as Record<string, unknown>)[key] = stored;
    (changed as Record<string, unknown>)[key] = value;
  }
  return { next, changed };
}
