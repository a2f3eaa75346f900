import { sql, type Transaction } from 'kysely';
import type { Database } from './schema';

export interface BulkColumn {
  name: string;
  /** PostgreSQL type of the column, for the array cast (e.g. 'uuid', 'numeric', 'text', 'jsonb') */
  type: string;
}

const SAFE_NAME = /^[a-z_][a-z0-9_]*$/;

/**
 * Inserts many rows with one `insert … select * from unnest($1::t1[], $2::t2[], …)` per chunk: one
 * round trip per chunk instead of per row, and the column arrays travel as parameters. Table and
 * column names are code constants (checked), never input.
 */
export async function bulkInsert(
  trx: Transaction<Database>,
  table: string,
  columns: readonly BulkColumn[],
  rows: readonly (readonly unknown[])[],
  chunkSize = 5000,
): Promise<void> {
  for (const name of [table, ...columns.map((c) => c.name)]) {
    if (!SAFE_NAME.test(name)) throw new Error(`bulkInsert: unsafe identifier ${name}`);
  }
  for (let start = 0; start < rows.length; start += chunkSize) {
    const chunk = rows.slice(start, start + chunkSize);
    const arrays = columns.map((_, index) => chunk.map((row) => row[index] ?? null));
    const unnestArgs = sql.join(
      columns.map((column, index) => sql`${arrays[index]}::${sql.raw(column.type)}[]`),
      sql`, `,
    );
    const columnList = sql.raw(columns.map((c) => c.name).join(', '));
    await sql`insert into ${sql.raw(table)} (${columnList}) select * from unnest(${unnestArgs})`.execute(trx);
  }
}
