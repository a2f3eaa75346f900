import { type Kysely, sql } from 'kysely';

/** Per-record review notes: the steward's comment on a returned record and the import's flags. */
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .alterTable('test_record')
    .addColumn('review_comment', 'text')
    .addColumn('import_flags', 'jsonb', (col) => col.notNull().defaultTo(sql`'[]'::jsonb`))
    .addColumn('row_number', 'integer')
    .execute();
  await sql`comment on column test_record.review_comment is 'The steward''s comment when the record was returned; shown beside the row to the contributor.'`.execute(
    db,
  );
  await sql`comment on column test_record.import_flags is 'Flags raised on import for the steward, e.g. identifying-looking free text: [{ field, reason }].'`.execute(
    db,
  );
  await sql`comment on column test_record.row_number is 'Row of the uploaded file the record came from (as a spreadsheet numbers it), so messages can point at it.'`.execute(
    db,
  );
  await db.schema
    .createIndex('submission_firm_checksum_idx')
    .on('submission')
    .columns(['firm_id', 'source_checksum_sha256'])
    .execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropIndex('submission_firm_checksum_idx').execute();
  await db.schema
    .alterTable('test_record')
    .dropColumn('review_comment')
    .dropColumn('import_flags')
    .dropColumn('row_number')
    .execute();
}
