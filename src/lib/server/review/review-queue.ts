import { type Kysely, sql } from 'kysely';
import type { Database } from '../db/schema';
import { inTenantTransaction } from '../tenancy/tenant-transaction';

export const STEWARD_SCOPE = { firmId: null, platformRole: 'steward' } as const;

/** Submissions waiting for a steward, oldest first, with record counts and how long they have waited. */
export async function reviewQueue(db: Kysely<Database>) {
  return inTenantTransaction(db, STEWARD_SCOPE, async (trx) => {
    const rows = await trx
      .selectFrom('submission as s')
      .innerJoin('organization as firm', 'firm.id', 's.firm_id')
      .select([
        's.id',
        's.status',
        's.source_kind as sourceKind',
        's.source_file_name as fileName',
        's.row_count as rowCount',
        's.submitted_at as submittedAt',
        'firm.name as firm',
        sql<number>`(select count(*) from test_record t where t.submission_id = s.id and jsonb_array_length(t.import_flags) > 0)`.as(
          'flaggedRows',
        ),
        sql<number>`extract(epoch from (now() - s.submitted_at)) / 86400`.as('waitingDays'),
      ])
      .where('s.status', 'in', ['submitted', 'in_review'])
      .orderBy('s.submitted_at')
      .execute();
    const totals = { submissions: rows.length, records: rows.reduce((sum, row) => sum + row.rowCount, 0) };
    return { totals, submissions: rows };
  });
}
