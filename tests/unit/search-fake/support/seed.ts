import type { Meilisearch } from 'meilisearch';
import { SOIL_RECORDS } from './soil-records';

export const FILTERABLE = ['unit', 'uscs', 'depth_m', 'cc', 'tags', 'note', 'lab'];
export const SORTABLE = ['depth_m', 'cc', 'uscs', 'unit'];

/** Creates an index holding the invented soil records, filterable and sortable as above. */
export async function seedSoilIndex(client: Meilisearch, uid: string, extra: Record<string, unknown> = {}): Promise<void> {
  const index = client.index(uid);
  const added = await index.addDocuments(SOIL_RECORDS as unknown as Record<string, unknown>[], { primaryKey: 'id' }).waitTask();
  if (added.status !== 'succeeded') throw new Error(`seeding ${uid} failed: ${JSON.stringify(added.error)}`);
  const settings = await index
    .updateSettings({ filterableAttributes: FILTERABLE, sortableAttributes: SORTABLE, ...extra })
    .waitTask();
  if (settings.status !== 'succeeded') throw new Error(`settings of ${uid} failed: ${JSON.stringify(settings.error)}`);
}

export function idsOf(hits: Array<Record<string, unknown>>): number[] {
  return hits.map((h) => h.id as number);
}

/** The error body a failed request carried (MeilisearchApiError keeps it as `cause`). */
export async function apiError(
  promise: Promise<unknown>,
): Promise<{ status: number; code: string; message: string; type: string }> {
  try {
    await promise;
  } catch (error) {
    const e = error as { cause?: { code: string; message: string; type: string }; response?: { status: number } };
    if (!e.cause || !e.response) throw error;
    return { status: e.response.status, code: e.cause.code, message: e.cause.message, type: e.cause.type };
  }
  throw new Error('the request succeeded but an error was expected');
}
