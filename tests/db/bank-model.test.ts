import { createHash, randomUUID } from 'node:crypto';
import { type Kysely, sql, type Transaction } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  type BankTables,
  GENESES,
  type NewTestRecord,
  SUBMISSION_STATUSES,
  TEST_RECORD_STATUSES,
  USCS_SYMBOLS,
} from '../../src/lib/server/db/bank-tables';
import { connectDatabase } from '../../src/lib/server/db/connect';
import type { Database } from '../../src/lib/server/db/schema';
import { inTenantTransaction } from '../../src/lib/server/tenancy/tenant-transaction';
import { testEnv } from '../support/env';

type BankDatabase = Database & BankTables;
type Scope = { firmId?: string; platformRole?: 'admin' | 'steward' | 'user' };

const app = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 3 });
const db = app.db as unknown as Kysely<BankDatabase>;

/** A transaction with the row-level-security context the app sets (the app's own helper). */
function within<T>(scope: Scope, fn: (trx: Transaction<BankDatabase>) => Promise<T>): Promise<T> {
  return inTenantTransaction(app.db, { firmId: scope.firmId ?? null, platformRole: scope.platformRole ?? null }, fn);
}

const tag = randomUUID().slice(0, 8);
const userId = `bank-model-user-${tag}`;
const firmId = `bank-model-firm-${tag}`;
const firm: Scope = { firmId };
let regionId = '';
let unitId = '';
let submissionId = '';

function record(overrides: Partial<NewTestRecord> = {}): NewTestRecord {
  return {
    submission_id: submissionId,
    firm_id: firmId,
    region_id: regionId,
    geological_unit_id: unitId,
    depth_top_m: 6.2,
    depth_bottom_m: 6.45,
    ...overrides,
  };
}

/** Inserts one record as the firm and resolves to the error PostgreSQL raised, or null. */
function refusal(overrides: Partial<NewTestRecord>): Promise<string | null> {
  return within(firm, (trx) => trx.insertInto('test_record').values(record(overrides)).execute())
    .then(() => null)
    .catch((error: Error) => error.message);
}

beforeAll(async () => {
  await sql`insert into "user" (id, name, email, "emailVerified", "createdAt", "updatedAt")
            values (${userId}, 'Bank model tester', ${`${userId}@example.test`}, true, now(), now())`.execute(db);
  await sql`insert into "organization" (id, name, slug, "createdAt") values (${firmId}, 'Bank model firm', ${firmId}, now())`.execute(
    db,
  );
  const region = await db
    .insertInto('region')
    .values({ name: `Saltreach Estuary ${tag}`, slug: `saltreach-estuary-${tag}`, created_by: userId })
    .returning('id')
    .executeTakeFirstOrThrow();
  regionId = region.id;
  const unit = await db
    .insertInto('geological_unit')
    .values({
      name: `Saltreach Estuarine Clay ${tag}`,
      slug: `saltreach-estuarine-clay-${tag}`,
      genesis: 'estuarine',
      age: 'Holocene',
      typical_region_id: regionId,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  unitId = unit.id;
  const submission = await within(firm, (trx) =>
    trx
      .insertInto('submission')
      .values({ firm_id: firmId, submitted_by: userId, source_kind: 'csv', source_file_name: 'oedometer.csv' })
      .returning('id')
      .executeTakeFirstOrThrow(),
  );
  submissionId = submission.id;
});

afterAll(async () => {
  await within(firm, async (trx) => {
    await trx.deleteFrom('test_record').where('firm_id', '=', firmId).execute();
    await trx.deleteFrom('submission').where('firm_id', '=', firmId).execute();
    await trx.deleteFrom('estimate').where('firm_id', '=', firmId).execute();
  });
  await db.deleteFrom('geological_unit').where('slug', 'like', `%-${tag}`).execute();
  await db.deleteFrom('region').where('id', '=', regionId).execute();
  await sql`delete from "organization" where id = ${firmId}`.execute(db);
  await sql`delete from "user" where id = ${userId}`.execute(db);
  await app.db.destroy();
});

describe('test record constraints', () => {
  it('accepts a complete record of a soft estuarine clay', async () => {
    const message = await refusal({
      uscs_symbol: 'CH',
      location_cell: 'E12-N07',
      water_content_pct: 82,
      liquid_limit_pct: 78,
      plastic_limit_pct: 31,
      plasticity_index_pct: 47,
      initial_void_ratio: 2.1,
      compression_index: 0.9,
      recompression_index: 0.1,
      test_method: 'incremental',
      sample_quality_class: 2,
    });
    expect(message).toBeNull();
  });

  it('accepts the extreme but real values of a fibrous peat', async () => {
    // common practice: peats reach wn of several hundred %, e0 above 10, Cc above 5, Gs near 1.5
    const message = await refusal({
      uscs_symbol: 'Pt',
      water_content_pct: 850,
      organic_content_pct: 85,
      specific_gravity: 1.45,
      bulk_unit_weight_kn_per_m3: 10.2,
      initial_void_ratio: 11.5,
      compression_index: 5.2,
      overconsolidation_ratio: 0.9,
      cv_nc_m2_per_year: 12,
    });
    expect(message).toBeNull();
  });

  it.each([
    ['a bottom depth equal to the top', { depth_top_m: 5, depth_bottom_m: 5 }, 'test_record_depth_bottom_below_top'],
    ['a bottom depth above the top', { depth_top_m: 5, depth_bottom_m: 4.8 }, 'test_record_depth_bottom_below_top'],
    ['a negative depth', { depth_top_m: -0.5, depth_bottom_m: 1 }, 'test_record_depth_top_not_negative'],
    ['an unknown record kind', { record_kind: 'triaxial' as never }, 'test_record_kind_known'],
    ['an unknown test method', { test_method: 'rowe' as never }, 'test_record_test_method_known'],
    ['an unknown group symbol', { uscs_symbol: 'CX' as never }, 'test_record_uscs_symbol_known'],
    ['a zero initial void ratio', { initial_void_ratio: 0 }, 'test_record_initial_void_ratio_positive'],
    ['a zero Cc', { compression_index: 0 }, 'test_record_cc_positive'],
    ['a negative Cr', { recompression_index: -0.01 }, 'test_record_cr_not_negative'],
    ['a liquid limit above 1000 %', { liquid_limit_pct: 1200 }, 'test_record_liquid_limit_range'],
    ['a PI above the LL', { liquid_limit_pct: 40, plasticity_index_pct: 45 }, 'test_record_plasticity_index_within_ll'],
    ['a negative water content', { water_content_pct: -3 }, 'test_record_water_content_not_negative'],
    ['a zero cv in the OC range', { cv_oc_m2_per_year: 0 }, 'test_record_cv_positive'],
    ['a quality class 5', { sample_quality_class: 5 as never }, 'test_record_quality_class_range'],
    ['exact coordinates in the location cell', { location_cell: '532410.5,181220.3' }, 'test_record_location_cell_format'],
  ])('refuses %s', async (_label, overrides, constraint) => {
    const message = await refusal(overrides);
    expect(message).toMatch(constraint);
  });

  it('refuses an unknown status and a published record without a bank version', async () => {
    // A firm cannot write these statuses at all (row-level security), so the steward's review path tries them.
    const review = (status: string) =>
      within({ firmId, platformRole: 'steward' }, async (trx) => {
        const { id } = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
        await trx
          .updateTable('test_record')
          .set({ status: status as never })
          .where('id', '=', id)
          .execute();
      });
    await expect(review('approved')).rejects.toThrow(/test_record_status_known/);
    await expect(review('published')).rejects.toThrow(/test_record_published_has_version/);
  });

  it('accepts every group symbol, status and genesis of the closed lists', async () => {
    const stored = await within({ firmId, platformRole: 'steward' }, async (trx) => {
      for (const uscs_symbol of USCS_SYMBOLS) await trx.insertInto('test_record').values(record({ uscs_symbol })).execute();
      const version = await trx
        .insertInto('bank_version')
        .values({ note: 'constraint test' })
        .returning('id')
        .executeTakeFirstOrThrow();
      for (const status of TEST_RECORD_STATUSES) {
        const inserted = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
        await trx.updateTable('test_record').set({ status, bank_version_id: version.id }).where('id', '=', inserted.id).execute();
      }
      for (const status of SUBMISSION_STATUSES) {
        const inserted = await trx
          .insertInto('submission')
          .values({ firm_id: firmId, source_kind: 'seed' })
          .returning('id')
          .executeTakeFirstOrThrow();
        await trx.updateTable('submission').set({ status }).where('id', '=', inserted.id).execute();
      }
      for (const genesis of GENESES) {
        await trx
          .insertInto('geological_unit')
          .values({ name: `${genesis} ${tag}`, slug: `${genesis}-${tag}`, genesis })
          .execute();
      }
      const distinct = async (query: string) =>
        (await sql.raw<{ value: string }>(query).execute(trx)).rows.map((row) => row.value).sort();
      const found = {
        symbols: await distinct(`select distinct uscs_symbol as value from test_record where uscs_symbol is not null`),
        recordStatuses: await distinct(`select distinct status as value from test_record`),
        submissionStatuses: await distinct(`select distinct status as value from submission`),
        geneses: await distinct(`select distinct genesis as value from geological_unit where slug like '%-${tag}'`),
      };
      await trx.deleteFrom('test_record').where('submission_id', '=', submissionId).execute();
      await trx.deleteFrom('bank_version').where('id', '=', version.id).execute();
      return found;
    });
    expect(stored).toEqual({
      symbols: [...USCS_SYMBOLS].sort(),
      recordStatuses: [...TEST_RECORD_STATUSES].sort(),
      submissionStatuses: [...SUBMISSION_STATUSES].sort(),
      geneses: [...GENESES].sort(),
    });
    await expect(
      db
        .insertInto('geological_unit')
        .values({ name: `Made ground ${tag}`, slug: `made-ground-${tag}`, genesis: 'anthropogenic' as never })
        .execute(),
    ).rejects.toThrow(/geological_unit_genesis_known/);
  });

  it('refuses an unknown submission status, source kind and a malformed checksum', async () => {
    const insert = (values: { source_kind?: never; source_checksum_sha256?: string }) =>
      within(firm, (trx) =>
        trx
          .insertInto('submission')
          .values({ firm_id: firmId, source_kind: 'csv', ...values })
          .execute(),
      );
    await expect(insert({ source_kind: 'xlsx' as never })).rejects.toThrow(/submission_source_kind_known/);
    await expect(insert({ source_checksum_sha256: 'ABC123' })).rejects.toThrow(/submission_checksum_format/);
    await expect(insert({ source_checksum_sha256: createHash('sha256').update('x').digest('hex') })).resolves.toBeDefined();
    const review = within({ platformRole: 'steward' }, (trx) =>
      trx
        .updateTable('submission')
        .set({ status: 'done' as never })
        .where('id', '=', submissionId)
        .execute(),
    );
    await expect(review).rejects.toThrow(/submission_status_known/);
  });
});

describe('stress levels', () => {
  it('keeps normally consolidated and overconsolidated cv apart and refuses any other range', async () => {
    const levels = await within(firm, async (trx) => {
      const { id } = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
      await trx
        .insertInto('test_record_stress_level')
        .values([
          {
            test_record_id: id,
            stress_from_kpa: 25,
            stress_to_kpa: 50,
            stress_range: 'OC',
            cv_m2_per_year: 8.5,
            cv_method: 'root_time',
          },
          {
            test_record_id: id,
            stress_from_kpa: 100,
            stress_to_kpa: 200,
            stress_range: 'NC',
            cv_m2_per_year: 1.2,
            cv_method: 'log_time',
          },
          {
            test_record_id: id,
            stress_from_kpa: 200,
            stress_to_kpa: 400,
            stress_range: 'NC',
            cv_m2_per_year: 0.9,
            cv_method: 'log_time',
          },
        ])
        .execute();
      return trx
        .selectFrom('test_record_stress_level')
        .select(['stress_range', (eb) => eb.fn.avg<number>('cv_m2_per_year').as('mean_cv')])
        .where('test_record_id', '=', id)
        .groupBy('stress_range')
        .orderBy('stress_range')
        .execute();
    });
    expect(levels).toEqual([
      { stress_range: 'NC', mean_cv: 1.05 },
      { stress_range: 'OC', mean_cv: 8.5 },
    ]);

    const insertLevel = (values: {
      stress_range?: string;
      stress_from_kpa?: number;
      stress_to_kpa?: number;
      cv_method?: string;
    }) =>
      within(firm, async (trx) => {
        const { id } = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
        await trx
          .insertInto('test_record_stress_level')
          .values({ test_record_id: id, stress_from_kpa: 50, stress_to_kpa: 100, stress_range: 'NC', ...values } as never)
          .execute();
      });
    await expect(insertLevel({ stress_range: 'nc' })).rejects.toThrow(/stress_level_range_known/);
    await expect(insertLevel({ stress_range: 'UC' })).rejects.toThrow(/stress_level_range_known/);
    await expect(insertLevel({ stress_to_kpa: 50 })).rejects.toThrow(/stress_level_stresses_valid/);
    await expect(insertLevel({ cv_method: 'guess' })).rejects.toThrow(/stress_level_cv_method_known/);
  });
});

describe('a whole oedometer test', () => {
  it('is read back in full, with numbers as numbers, by the owning firm', async () => {
    const recordId = await within(firm, async (trx) => {
      const { id } = await trx
        .insertInto('test_record')
        .values(
          record({
            depth_top_m: 7.25,
            depth_bottom_m: 7.5,
            uscs_symbol: 'CH',
            sampling_method: 'piston',
            initial_void_ratio: 2.05,
            compression_index: 0.915,
            preconsolidation_stress_kpa: 62.5,
            vertical_effective_stress_kpa: 48,
            overconsolidation_ratio: 1.3,
            permeability_m_per_s: 1.2e-9,
            delta_e_over_e0: 0.035,
            sample_quality_class: 1,
            test_method: 'incremental',
            test_standard: 'ASTM D2435',
          }),
        )
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx
        .insertInto('test_record_private')
        .values({ test_record_id: id, firm_id: firmId, project_name: 'Harbour link', borehole_id: 'BH-07', sample_id: 'U12' })
        .execute();
      await trx
        .insertInto('test_record_stress_level')
        .values({ test_record_id: id, stress_from_kpa: 100, stress_to_kpa: 200, stress_range: 'NC', cv_m2_per_year: 1.4 })
        .execute();
      const increments = await trx
        .insertInto('oedometer_increment')
        .values([
          { test_record_id: id, increment_no: 1, applied_stress_kpa: 25, duration_hours: 24, specimen_height_mm: 20 },
          { test_record_id: id, increment_no: 2, applied_stress_kpa: 50, duration_hours: 24, end_void_ratio: 1.98 },
        ])
        .returning(['id', 'increment_no'])
        .execute();
      const second = increments.find((increment) => increment.increment_no === 2);
      if (!second) throw new Error('increment 2 was not returned');
      await trx
        .insertInto('oedometer_reading')
        .values(
          [0.1, 1, 4, 16, 60].map((elapsed_minutes, index) => ({
            increment_id: second.id,
            elapsed_minutes,
            deformation_mm: 0.21 + 0.05 * index,
          })),
        )
        .execute();
      return id;
    });

    const back = await within(firm, async (trx) => ({
      record: await trx
        .selectFrom('test_record')
        .innerJoin('test_record_private', 'test_record_private.test_record_id', 'test_record.id')
        .select(['depth_top_m', 'compression_index', 'permeability_m_per_s', 'sample_quality_class', 'borehole_id', 'status'])
        .where('test_record.id', '=', recordId)
        .executeTakeFirstOrThrow(),
      levels: await trx
        .selectFrom('test_record_stress_level')
        .select('cv_m2_per_year')
        .where('test_record_id', '=', recordId)
        .execute(),
      readings: await trx
        .selectFrom('oedometer_reading')
        .innerJoin('oedometer_increment', 'oedometer_increment.id', 'oedometer_reading.increment_id')
        .select(['increment_no', 'elapsed_minutes', 'deformation_mm', 'oedometer_reading.id'])
        .where('test_record_id', '=', recordId)
        .orderBy('elapsed_minutes')
        .execute(),
    }));
    expect(back.record).toEqual({
      depth_top_m: 7.25,
      compression_index: 0.915,
      permeability_m_per_s: 1.2e-9,
      sample_quality_class: 1,
      borehole_id: 'BH-07',
      status: 'pending',
    });
    expect(back.levels).toEqual([{ cv_m2_per_year: 1.4 }]);
    expect(back.readings.map((reading) => reading.elapsed_minutes)).toEqual([0.1, 1, 4, 16, 60]);
    expect(back.readings.every((reading) => reading.increment_no === 2 && typeof reading.id === 'number')).toBe(true);
    expect(back.readings[4]?.deformation_mm).toBeCloseTo(0.41, 10);
  });

  it('refuses two increments with the same number in one test', async () => {
    const insert = within(firm, async (trx) => {
      const { id } = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
      await trx
        .insertInto('oedometer_increment')
        .values([
          { test_record_id: id, increment_no: 1, applied_stress_kpa: 25 },
          { test_record_id: id, increment_no: 1, applied_stress_kpa: 50 },
        ])
        .execute();
    });
    await expect(insert).rejects.toThrow(/oedometer_increment_number_unique/);
  });
});

describe('cascades', () => {
  it('deleting a test record removes its private row, stress levels, increments and readings', async () => {
    const counts = await within(firm, async (trx) => {
      const { id } = await trx.insertInto('test_record').values(record()).returning('id').executeTakeFirstOrThrow();
      await trx
        .insertInto('test_record_private')
        .values({ test_record_id: id, firm_id: firmId, notes: 'to be deleted' })
        .execute();
      await trx
        .insertInto('test_record_stress_level')
        .values({ test_record_id: id, stress_from_kpa: 50, stress_to_kpa: 100, stress_range: 'OC' })
        .execute();
      const increment = await trx
        .insertInto('oedometer_increment')
        .values({ test_record_id: id, increment_no: 1, applied_stress_kpa: 25 })
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx
        .insertInto('oedometer_reading')
        .values({ increment_id: increment.id, elapsed_minutes: 1, deformation_mm: 0.1 })
        .execute();

      const count = async () => ({
        private: await countWhere(trx, 'test_record_private', 'test_record_id', id),
        levels: await countWhere(trx, 'test_record_stress_level', 'test_record_id', id),
        increments: await countWhere(trx, 'oedometer_increment', 'test_record_id', id),
        readings: await countWhere(trx, 'oedometer_reading', 'increment_id', increment.id),
      });
      const before = await count();
      await trx.deleteFrom('test_record').where('id', '=', id).execute();
      return { before, after: await count() };
    });
    expect(counts.before).toEqual({ private: 1, levels: 1, increments: 1, readings: 1 });
    expect(counts.after).toEqual({ private: 0, levels: 0, increments: 0, readings: 0 });
  });

  it('deleting a submission removes its history and files but not records that still point at it', async () => {
    const content = Buffer.from('depth_top_m,depth_bottom_m\n6.2,6.45\n');
    const counts = await within(firm, async (trx) => {
      const { id } = await trx
        .insertInto('submission')
        .values({ firm_id: firmId, source_kind: 'csv' })
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx.insertInto('submission_event').values({ submission_id: id, actor_user_id: userId, to_status: 'draft' }).execute();
      await trx
        .insertInto('submission_file')
        .values({
          submission_id: id,
          firm_id: firmId,
          storage_name: `${randomUUID()}.csv`,
          original_name: 'oedometer.csv',
          media_type: 'text/csv',
          size_bytes: content.length,
          sha256: createHash('sha256').update(content).digest('hex'),
          content,
        })
        .execute();
      const stored = await trx
        .selectFrom('submission_file')
        .select(['content', 'size_bytes'])
        .where('submission_id', '=', id)
        .executeTakeFirstOrThrow();
      const before = {
        events: await countWhere(trx, 'submission_event', 'submission_id', id),
        files: await countWhere(trx, 'submission_file', 'submission_id', id),
      };
      await trx.deleteFrom('submission').where('id', '=', id).execute();
      const after = {
        events: await countWhere(trx, 'submission_event', 'submission_id', id),
        files: await countWhere(trx, 'submission_file', 'submission_id', id),
      };
      return { stored, before, after };
    });
    expect(counts.stored).toEqual({ content, size_bytes: content.length });
    expect(counts.before).toEqual({ events: 1, files: 1 });
    expect(counts.after).toEqual({ events: 0, files: 0 });

    const withRecord = within(firm, async (trx) => {
      const { id } = await trx
        .insertInto('submission')
        .values({ firm_id: firmId, source_kind: 'csv' })
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx
        .insertInto('test_record')
        .values(record({ submission_id: id }))
        .execute();
      await trx.deleteFrom('submission').where('id', '=', id).execute();
    });
    await expect(withRecord).rejects.toThrow(/test_record_submission_same_firm/);
  });

  it('refuses a stored file whose size does not match its content', async () => {
    const insert = within(firm, (trx) =>
      trx
        .insertInto('submission_file')
        .values({
          submission_id: submissionId,
          firm_id: firmId,
          storage_name: `${randomUUID()}.csv`,
          original_name: 'short.csv',
          media_type: 'text/csv',
          size_bytes: 999,
          sha256: createHash('sha256').update('a').digest('hex'),
          content: Buffer.from('a'),
        })
        .execute(),
    );
    await expect(insert).rejects.toThrow(/submission_file_size_matches/);
  });
});

describe('estimates', () => {
  it('round-trips input as jsonb and records the bank version it used', async () => {
    const input = { layers: [{ unit: 'Saltreach Estuarine Clay', thicknessM: 8 }], loadKpa: 60 };
    const saved = await within(firm, async (trx) => {
      const version = await trx
        .insertInto('bank_version')
        .values({ note: 'estimate test', record_count: 0 })
        .returning('id')
        .executeTakeFirstOrThrow();
      const { id } = await trx
        .insertInto('estimate')
        .values({
          firm_id: firmId,
          created_by: userId,
          name: 'Embankment ch. 400',
          input: JSON.stringify(input),
          bank_version_id: version.id,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      return trx
        .selectFrom('estimate')
        .select(['input', 'unit_system', 'bank_version_id'])
        .where('id', '=', id)
        .executeTakeFirstOrThrow();
    });
    expect(saved.input).toEqual(input);
    expect(saved.unit_system).toBe('SI');
    expect(typeof saved.bank_version_id).toBe('number');
    await within(firm, (trx) => trx.deleteFrom('estimate').where('firm_id', '=', firmId).execute());
    await db
      .deleteFrom('bank_version')
      .where('id', '=', saved.bank_version_id ?? -1)
      .execute();
  });
});

type CountedTable =
  | 'test_record_private'
  | 'test_record_stress_level'
  | 'oedometer_increment'
  | 'oedometer_reading'
  | 'submission_event'
  | 'submission_file';

async function countWhere(trx: Transaction<BankDatabase>, table: CountedTable, column: string, value: string): Promise<number> {
  const { rows } = await sql<{
    n: number;
  }>`select count(*)::int as n from ${sql.table(table)} where ${sql.ref(column)} = ${value}`.execute(trx);
  return rows[0]?.n ?? -1;
}
