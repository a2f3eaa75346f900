import { Meilisearch } from 'meilisearch';
import { config } from '../config';

let client: Meilisearch | null | undefined;

/**
 * The one search-service client, from MEILISEARCH_URL and MEILISEARCH_KEY; null when search is not
 * configured. Writes return tasks: await `.waitTask()` and check `status`, since a failed task resolves.
 */
export function searchClient(): Meilisearch | null {
  if (client === undefined) {
    client = config.meilisearchUrl
      ? new Meilisearch({ host: config.meilisearchUrl, apiKey: config.meilisearchKey ?? undefined, timeout: 10_000 })
      : null;
  }
  return client;
}
