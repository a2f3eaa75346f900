import { sql } from 'kysely';
import { MeilisearchApiError } from 'meilisearch';
import type { AppServices } from '../app-services';
import { config } from '../config';
import { searchClient } from '../search/client';

export type ServiceState = 'up' | 'down' | 'not configured';

export interface ServiceHealth {
  status: ServiceState;
  latencyMs?: number;
  detail?: string;
}

export interface HealthReport {
  status: 'ok' | 'degraded' | 'down';
  checkedAt: string;
  database: ServiceHealth & { schemaVersion?: string | null };
  mail: ServiceHealth;
  search: ServiceHealth;
}

const TIMEOUT_MS = 2_500;

async function timed<T>(probe: () => Promise<T>): Promise<{ value: T; latencyMs: number }> {
  const started = performance.now();
  const value = await Promise.race([
    probe(),
    new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`no answer within ${TIMEOUT_MS} ms`)), TIMEOUT_MS)),
  ]);
  return { value, latencyMs: Math.round(performance.now() - started) };
}

function failure(error: unknown): ServiceHealth {
  return { status: 'down', detail: error instanceof Error ? error.message.split('\n')[0] : 'unreachable' };
}

async function checkDatabase(app: Pick<AppServices, 'db'>): Promise<HealthReport['database']> {
  if (!config.databaseUrl) return { status: 'not configured', detail: 'DATABASE_URL is not set' };
  try {
    const { value, latencyMs } = await timed(async () => {
      const { rows } = await sql<{ name: string | null }>`
        select max(name) as name from kysely_migration`.execute(app.db);
      return rows[0]?.name ?? null;
    });
    return { status: 'up', latencyMs, schemaVersion: value };
  } catch (error) {
    // The detail of a database error can name hosts and roles; keep it in the log.
    console.error('[health] database check failed:', error instanceof Error ? error.message : error);
    return { status: 'down', detail: 'the database did not answer' };
  }
}

async function checkMail(app: Pick<AppServices, 'mailer'>): Promise<ServiceHealth> {
  try {
    const { latencyMs } = await timed(() => app.mailer.verify());
    return { status: 'up', latencyMs };
  } catch (error) {
    return failure(error);
  }
}

async function checkSearch(): Promise<ServiceHealth> {
  const client = searchClient();
  if (!client) return { status: 'not configured' };
  try {
    // The version route needs the key, so a wrong key shows as down rather than up.
    const { latencyMs } = await timed(() => client.getVersion());
    return { status: 'up', latencyMs };
  } catch (error) {
    // The client's messages name the service's address; keep them in the log.
    console.error('[health] search check failed:', error instanceof Error ? error.message : error);
    const refused = error instanceof MeilisearchApiError && (error.response?.status === 401 || error.response?.status === 403);
    return { status: 'down', detail: refused ? 'the search service refused the key' : 'the search service did not answer' };
  }
}

/** Database, mail and search status; the app is down when the database is. */
export async function checkHealth(app: Pick<AppServices, 'db' | 'mailer'>): Promise<HealthReport> {
  const [database, mail, search] = await Promise.all([checkDatabase(app), checkMail(app), checkSearch()]);
  const degraded = mail.status === 'down' || search.status === 'down';
  const status = database.status !== 'up' ? 'down' : degraded ? 'degraded' : 'ok';
  return { status, checkedAt: new Date().toISOString(), database, mail, search };
}
