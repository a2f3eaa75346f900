import { type Kysely, sql } from 'kysely';

/**
 * pgcrypto's hmac(), so that the statistics query derives each test's secret masking key in the
 * database (HMAC-SHA-256 of the record id under a secret the app passes as a parameter) while the
 * rows stream out, instead of hashing 100,000 ids on the app server. pgcrypto is a trusted extension
 * (PostgreSQL 13 and later): the database owner may create it.
 */
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`create extension if not exists pgcrypto`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop extension if exists pgcrypto`.execute(db);
}
