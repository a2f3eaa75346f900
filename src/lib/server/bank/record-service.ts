import type { Kysely } from 'kysely';
import { hasPermission } from '../../permissions/roles';
import type { ResolvedIdentity } from '../auth/resolve-actor';
import type { Database } from '../db/schema';
import { ApiError } from '../http/api-error';
import { scopeOf } from '../tenancy/scope';
import { inTenantTransaction } from '../tenancy/tenant-transaction';
import { PRIVATE_RECORD_COLUMNS, SHARED_RECORD_COLUMNS } from './record-columns';

export interface RecordPage {
  limit: number;
  offset: number;
}

/**
 * Published test records plus the caller's own firm's records (any status). Row-level security
 * repeats the same rule in the database.
 */
export async function listRecords(db: Kysely<Database>, identity: ResolvedIdentity, page: RecordPage) {
  const firmId = identity.actor.firmId;
  return inTenantTransaction(db, scopeOf(identity), async (trx) => {
    const base = trx
      .selectFrom('test_record as r')
      .innerJoin('region', 'region.id', 'r.region_id')
      .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
      .where((eb) =>
        firmId ? eb.or([eb('r.status', '=', 'published'), eb('r.firm_id', '=', firmId)]) : eb('r.status', '=', 'published'),
      );
    const { total } = await base.select((eb) => eb.fn.countAll<number>().as('total')).executeTakeFirstOrThrow();
    const rows = await base
      .select([...SHARED_RECORD_COLUMNS, 'r.firm_id'])
      .orderBy('unit.name')
      .orderBy('r.depth_top_m')
      .orderBy('r.id')
      .limit(page.limit)
      .offset(page.offset)
      .execute();
    const records = rows.map(({ firm_id, ...record }) => ({ ...record, mine: firm_id === firmId }));
    return { total, limit: page.limit, offset: page.offset, records };
  });
}

/** One test record, with its stress levels; the private block only for the owning firm. 404 when not visible. */
export async function getRecord(db: Kysely<Database>, identity: ResolvedIdentity, recordId: string) {
  const { firmId } = identity.actor;
  const stewardView = hasPermission(identity.actor, 'submission', 'review');
  return inTenantTransaction(db, scopeOf(identity), async (trx) => {
    const row = await trx
      .selectFrom('test_record as r')
      .innerJoin('region', 'region.id', 'r.region_id')
      .innerJoin('geological_unit as unit', 'unit.id', 'r.geological_unit_id')
      .select([...SHARED_RECORD_COLUMNS, 'r.firm_id'])
      .where('r.id', '=', recordId)
      .executeTakeFirst();
    const mine = row !== undefined && firmId !== null && row.firm_id === firmId;
    const visible = row !== undefined && (row.status === 'published' || mine || (stewardView && row.status === 'pending'));
    if (!row || !visible) throw new ApiError('NOT_FOUND', 'There is no test record with that id that you can see.');
    const { firm_id: _firm, ...record } = row;
    const stressLevels = await trx
      .selectFrom('test_record_stress_level')
      .select([
        'stress_from_kpa as stressFromKpa',
        'stress_to_kpa as stressToKpa',
        'stress_range as stressRange',
        'cv_m2_per_year as cvM2PerYear',
        'secondary_compression_index as secondaryCompressionIndex',
        'mv_m2_per_mn as mvM2PerMn',
        'permeability_m_per_s as permeabilityMPerS',
        'cv_method as cvMethod',
      ])
      .where('test_record_id', '=', recordId)
      .orderBy('stress_from_kpa')
      .execute();
    const canSeePrivate = mine && hasPermission(identity.actor, 'record', 'read-private');
    const privateDetails = canSeePrivate
      ? ((await trx
          .selectFrom('test_record_private as p')
          .select(PRIVATE_RECORD_COLUMNS)
          .where('p.test_record_id', '=', recordId)
          .executeTakeFirst()) ?? null)
      : undefined;
    return { record: { ...record, mine, stressLevels }, ...(privateDetails !== undefined ? { private: privateDetails } : {}) };
  });
}
