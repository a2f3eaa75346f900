import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import Cursor from 'pg-cursor';
import type { Database } from './schema';

// numeric and bigint arrive from pg as strings; the bank stores engineering values as numeric
// and counts as bigint, and callers want numbers.
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (value) => Number.parseFloat(value));
pg.types.setTypeParser(pg.types.builtins.INT8, (value) => Number.parseInt(value, 10));

export interface DatabaseHandle {
  db: Kysely<Database>;
  pool: pg.Pool;
}

/** One pool and one Kysely instance for a connection string. */
export function connectDatabase(connectionString: string, options: { max?: number } = {}): DatabaseHandle {
  const pool = new pg.Pool({
    connectionString,
    max: options.max ?? 10,
    connectionTimeoutMillis: 5_000,
    idleTimeoutMillis: 30_000,
  });
  // Without a listener an idle client's error (e.g. the server restarting) would kill the process.
  pool.on('error', (error) => console.error(`[db] idle connection lost: ${error.message}`));
  // A connection that breaks while checked out also emits 'error'; the query in flight already fails
  // with it, so log it here instead of letting it crash the process.
  pool.on('connect', (client) => client.on('error', (error) => console.error(`[db] connection lost: ${error.message}`)));
  // The cursor lets a repository stream a large result (`.stream()`) instead of holding every row at once.
  return { db: new Kysely<Database>({ dialect: new PostgresDialect({ pool, cursor: Cursor }) }), pool };
}
