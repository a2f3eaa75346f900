import { type Kysely, sql } from 'kysely';

/**
 * Curating the vocabulary over time: a renamed region or unit keeps its old names as synonyms (uploads that
 * use them still match), an entry can be retired (no new uploads; its records stay), and a geological unit
 * merged into another keeps a pointer to the one that absorbed its records.
 */
export async function up(db: Kysely<unknown>): Promise<void> {
  for (const table of ['region', 'geological_unit']) {
    await db.schema
      .alterTable(table)
      .addColumn('synonyms', sql`text[]`, (col) => col.notNull().defaultTo(sql`'{}'::text[]`))
      .addColumn('retired_at', 'timestamptz')
      .execute();
    await sql`comment on column ${sql.raw(`${table}.synonyms`)} is ${sql.lit(
      'Other names uploads may use for this entry: earlier names kept on a rename, names of units merged into it.',
    )}`.execute(db);
    await sql`comment on column ${sql.raw(`${table}.retired_at`)} is ${sql.lit(
      'When the entry was retired: it takes no new uploads; records already in it stay.',
    )}`.execute(db);
  }
  await db.schema
    .alterTable('geological_unit')
    .addColumn('merged_into_id', 'uuid', (col) => col.references('geological_unit.id').onDelete('set null'))
    .execute();
  await db.schema
    .alterTable('geological_unit')
    .addCheckConstraint('geological_unit_not_merged_into_itself', sql`merged_into_id is distinct from id`)
    .execute();
  await db.schema
    .alterTable('geological_unit')
    .addCheckConstraint('geological_unit_merged_is_retired', sql`merged_into_id is null or retired_at is not null`)
    .execute();
  await sql`comment on column geological_unit.merged_into_id is 'The unit that absorbed this one and its records; set together with retired_at.'`.execute(
    db,
  );
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('geological_unit').dropColumn('merged_into_id').execute();
  for (const table of ['region', 'geological_unit']) {
    await db.schema.alterTable(table).dropColumn('synonyms').dropColumn('retired_at').execute();
  }
}
