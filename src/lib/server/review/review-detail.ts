import type { Kysely } from 'kysely';
import { compareWithPool } from '../../statistics/pool-comparison';
import { SHARED_RECORD_COLUMNS } from '../bank/record-columns';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { STEWARD_SCOPE } from './review-queue';

/** Values compared with the deposit's published records; cv and k on a log scale. */
const COMPARED = [
  { key: 'compressionIndex', column: 'compression_index', log: false },
  { key: 'recompressionIndex', column: 'recompression_index', log: false },
  { key: 'initialVoidRatio', column: 'initial_void_ratio', log: false },
  { key: 'waterContentPct', column: 'water_content_pct', log: false },
  { key: 'liquidLimitPct', column: 'liquid_limit_pct', log: false },
  { key: 'overconsolidationRatio', column: 'overconsolidation_ratio', log: false },
  { key: 'preconsolidationStressKpa', column: 'preconsolidation_stress_kpa', log: false },
  { key: 'cvNcM2PerYear', column: 'cv_nc_m2_per_year', log: true },
  { key: 'secondaryCompressionIndex', column: 'secondary_compression_index', log: false },
] as const;

/**
 * A submission as the steward sees it: shared values only (never the firm's private details), each
 * record against the published records of its geological unit, import flags, raw readings and the
 * history.
 */
export async function reviewDetail(db: Kysely<Database>, submissionId: string) {
  return inTenantTransaction(db, STEWARD_SCOPE, async (trx) => {
    const submission = await trx
      .selectFrom('submission as s')
      .innerJoin('organization as firm', 'firm.id', 's.firm_id')
      .select([
        's.id',
        's.status',
        's.source_kind as sourceKind',
        's.source_file_name as fileName',
        's.row_count as rowCount',
        's.submitted_at as submittedAt',
        's.steward_comment as stewardComment',
        'firm.name as firm',
      ])
      .where('s.id', '=', submissionId)
      .where('s.status', '!=', 'draft')
      .executeTakeFirst();
    if (!submission) throw new ApiError('NOT_FOUND', 'There is no such submission waiting for review.');

    const records = await trx
      .selectFrom('test_record as r')
      .innerJoin('region', 'region.id', 'r.region_id')
      .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
      .select([
        ...SHARED_RECORD_COLUMNS,
        'r.geological_unit_id as unitId',
        'r.row_number as rowNumber',
        'r.review_comment as reviewComment',
        'r.import_flags as importFlags',
      ])
      .where('r.submission_id', '=', submissionId)
      .orderBy('r.row_number')
      .execute();

    const unitIds = [...new Set(records.map((r) => r.unitId))];
    const pool = unitIds.length
      ? await trx
          .selectFrom('test_record')
          .select(['geological_unit_id as unitId', ...COMPARED.map((c) => c.column)])
          .where('status', '=', 'published')
          .where('geological_unit_id', 'in', unitIds)
          .execute()
      : [];

    const recordIds = records.map((r) => r.id);
    const increments = recordIds.length
      ? await trx
          .selectFrom('oedometer_increment')
          .select([
            'test_record_id as recordId',
            'increment_no as incrementNo',
            'applied_stress_kpa as appliedStressKpa',
            'end_void_ratio as endVoidRatio',
            'is_unloading as isUnloading',
          ])
          .where('test_record_id', 'in', recordIds)
          .orderBy('test_record_id')
          .orderBy('increment_no')
          .execute()
      : [];

    const history = await trx
      .selectFrom('submission_event as e')
      .leftJoin('user as u', 'u.id', 'e.actor_user_id')
      .select([
        'e.occurred_at as occurredAt',
        'u.name as actor',
        'e.from_status as fromStatus',
        'e.to_status as toStatus',
        'e.comment',
      ])
      .where('e.submission_id', '=', submissionId)
      .orderBy('e.occurred_at')
      .execute();

    const withComparison = records.map(({ unitId, ...record }) => {
      const unitPool = pool.filter((p) => p.unitId === unitId);
      const comparison = Object.fromEntries(
        COMPARED.map((c) => [
          c.key,
          compareWithPool(
            unitPool.map((p) => p[c.column]).filter((x): x is number => x !== null),
            record[c.key],
            c.log,
          ),
        ]),
      );
      const outliers = COMPARED.filter((c) => comparison[c.key]?.outlier).map((c) => c.key);
      return {
        ...record,
        comparison,
        outliers,
        increments: increments.filter((i) => i.recordId === record.id).map(({ recordId: _r, ...i }) => i),
      };
    });
    return { submission, records: withComparison, history };
  });
}
