import { type Kysely, sql } from 'kysely';

/**
 * test_record.firm_id is already tied to its submission's firm by test_record_submission_same_firm,
 * and submission.firm_id references organization; the direct reference was a second check of the same
 * fact on every inserted record (measurable on 100,000-row uploads).
 */
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`alter table test_record drop constraint test_record_firm_id_fkey`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`alter table test_record add constraint test_record_firm_id_fkey foreign key (firm_id) references organization (id)`.execute(
    db,
  );
}
