// Errors in the search service's own envelope: { message, code, type, link } with the HTTP status
// that belongs to each code.

export type ErrorType = 'invalid_request' | 'internal' | 'auth' | 'system';

const STATUS_BY_CODE: Record<string, [number, ErrorType]> = {
  bad_request: [400, 'invalid_request'],
  malformed_payload: [400, 'invalid_request'],
  missing_payload: [400, 'invalid_request'],
  invalid_document_id: [400, 'invalid_request'],
  missing_document_id: [400, 'invalid_request'],
  invalid_document_filter: [400, 'invalid_request'],
  missing_document_filter: [400, 'invalid_request'],
  invalid_document_fields: [400, 'invalid_request'],
  invalid_document_limit: [400, 'invalid_request'],
  invalid_document_offset: [400, 'invalid_request'],
  invalid_document_ids: [400, 'invalid_request'],
  invalid_index_uid: [400, 'invalid_request'],
  invalid_index_primary_key: [400, 'invalid_request'],
  invalid_index_limit: [400, 'invalid_request'],
  invalid_index_offset: [400, 'invalid_request'],
  index_primary_key_already_exists: [400, 'invalid_request'],
  index_primary_key_no_candidate_found: [400, 'invalid_request'],
  index_primary_key_multiple_candidates_found: [400, 'invalid_request'],
  invalid_search_q: [400, 'invalid_request'],
  invalid_search_filter: [400, 'invalid_request'],
  invalid_search_sort: [400, 'invalid_request'],
  invalid_search_facets: [400, 'invalid_request'],
  invalid_search_limit: [400, 'invalid_request'],
  invalid_search_offset: [400, 'invalid_request'],
  invalid_search_page: [400, 'invalid_request'],
  invalid_search_hits_per_page: [400, 'invalid_request'],
  invalid_search_attributes_to_retrieve: [400, 'invalid_request'],
  invalid_search_attributes_to_search_on: [400, 'invalid_request'],
  invalid_search_matching_strategy: [400, 'invalid_request'],
  invalid_facet_search_facet_name: [400, 'invalid_request'],
  invalid_facet_search_facet_query: [400, 'invalid_request'],
  invalid_settings_filterable_attributes: [400, 'invalid_request'],
  invalid_settings_sortable_attributes: [400, 'invalid_request'],
  invalid_settings_searchable_attributes: [400, 'invalid_request'],
  invalid_settings_displayed_attributes: [400, 'invalid_request'],
  invalid_settings_ranking_rules: [400, 'invalid_request'],
  invalid_settings_faceting: [400, 'invalid_request'],
  invalid_settings_pagination: [400, 'invalid_request'],
  invalid_settings_typo_tolerance: [400, 'invalid_request'],
  invalid_settings_stop_words: [400, 'invalid_request'],
  invalid_settings_synonyms: [400, 'invalid_request'],
  invalid_settings_distinct_attribute: [400, 'invalid_request'],
  invalid_task_uids: [400, 'invalid_request'],
  invalid_task_statuses: [400, 'invalid_request'],
  invalid_task_types: [400, 'invalid_request'],
  invalid_task_index_uids: [400, 'invalid_request'],
  invalid_task_limit: [400, 'invalid_request'],
  invalid_task_from: [400, 'invalid_request'],
  invalid_task_reverse: [400, 'invalid_request'],
  missing_authorization_header: [401, 'auth'],
  invalid_api_key: [403, 'auth'],
  index_not_found: [404, 'invalid_request'],
  document_not_found: [404, 'invalid_request'],
  task_not_found: [404, 'invalid_request'],
  not_found: [404, 'invalid_request'],
  method_not_allowed: [405, 'invalid_request'],
  index_already_exists: [409, 'invalid_request'],
  payload_too_large: [413, 'invalid_request'],
  invalid_content_type: [415, 'invalid_request'],
  missing_content_type: [415, 'invalid_request'],
  internal: [500, 'internal'],
};

export interface ErrorBody {
  message: string;
  code: string;
  type: ErrorType;
  link: string;
}

/** An error the service answers with (synchronously as HTTP, or inside a failed task). */
export class SearchFakeError extends Error {
  readonly code: string;

  constructor(code: string, message: string) {
    super(message);
    if (!(code in STATUS_BY_CODE)) throw new Error(`unknown error code ${code}`);
    this.code = code;
  }

  get status(): number {
    return STATUS_BY_CODE[this.code]?.[0] ?? 500;
  }

  toBody(): ErrorBody {
    return {
      message: this.message,
      code: this.code,
      type: STATUS_BY_CODE[this.code]?.[1] ?? 'internal',
      link: `https://docs.meilisearch.com/errors#${this.code}`,
    };
  }
}

export const indexNotFound = (uid: string) => new SearchFakeError('index_not_found', `Index \`${uid}\` not found.`);

/** How a JSON value is described in type errors ("a string: `\"x\"`"). */
export function describeJson(value: unknown): string {
  const shown = JSON.stringify(value);
  if (value === null) return `null: \`${shown}\``;
  if (Array.isArray(value)) return `an array: \`${shown}\``;
  if (typeof value === 'object') return `an object: \`${shown}\``;
  if (typeof value === 'string') return `a string: \`${shown}\``;
  if (typeof value === 'boolean') return `a boolean: \`${shown}\``;
  if (typeof value === 'number') {
    if (!Number.isInteger(value)) return `a float: \`${shown}\``;
    return value < 0 ? `a negative integer: \`${shown}\`` : `a positive integer: \`${shown}\``;
  }
  return `\`${shown}\``;
}
