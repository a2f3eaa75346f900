import { type Kysely, sql } from 'kysely';

/** Settings the shell needs (demo scenario marker, bank-wide options). */
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('app_setting')
    .addColumn('key', 'text', (col) => col.primaryKey())
    .addColumn('value', 'jsonb', (col) => col.notNull())
    .addColumn('updated_at', 'timestamptz', (col) => col.notNull().defaultTo(sql`now()`))
    .execute();
  await sql`comment on table app_setting is 'Key-value settings of the whole installation, e.g. which demo scenario was loaded.'`.execute(
    db,
  );
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('app_setting').execute();
}
