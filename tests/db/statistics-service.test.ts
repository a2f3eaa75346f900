// The statistics service against the real PostgreSQL: masking keys computed by the database equal the
// keyed hash computed in Node, the NC/OC split from stress levels equals the core's, the tenant rule,
// the bank-wide disclosure rule, and the answer cache.
import { randomUUID } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ResolvedIdentity } from '../../src/lib/server/auth/resolve-actor';
import { connectDatabase } from '../../src/lib/server/db/connect';
import { readDisclosureRule } from '../../src/lib/server/settings/settings-service';
import type { SelectionRow } from '../../src/lib/server/statistics/columns-builder';
import { recordKeyOf } from '../../src/lib/server/statistics/record-key';
import { createStatisticsRuntime } from '../../src/lib/server/statistics/statistics-pool';
import { streamSelectionRows } from '../../src/lib/server/statistics/statistics-repository';
import { selectionOverview } from '../../src/lib/server/statistics/statistics-service';
import { inTenantTransaction, type TenantScope } from '../../src/lib/server/tenancy/tenant-transaction';
import { splitByStressRange } from '../../src/lib/statistics';
import { testEnv } from '../support/env';

const app = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 3 });
const db = app.db;
const SECRET = 'statistics-db-test-record-key-secret-0123456789';
const tag = randomUUID().slice(0, 8);
const firmId = `stats-firm-${tag}`;
const otherFirmId = `stats-other-${tag}`;
const unitSlug = `stats-db-clay-${tag}`;
const recordIds: Record<string, string> = {};
const runtime = createStatisticsRuntime({
  workerFile: fileURLToPath(new URL('../../src/lib/server/statistics/statistics-task-dev.mjs', import.meta.url)),
  recordKeySecret: SECRET,
  threads: 1,
});

const firm: TenantScope = { firmId, platformRole: 'user' };
const steward: TenantScope = { firmId: null, platformRole: 'steward' };
const identityOf = (firm: string | null) =>
  ({
    actor: { userId: 'stats-tester', platformRole: 'user', firmId: firm, firmRole: firm ? 'engineer' : null },
  }) as ResolvedIdentity;

/** Levels of the test with σ'p = 100 kPa; the second is declared OC by the laboratory but ends at σ'p. */
const LEVELS = [
  { stressFromKpa: 25, stressToKpa: 50, stressRange: 'OC' as const, cvM2PerYear: 20, secondaryCompressionIndex: 0.005 },
  { stressFromKpa: 50, stressToKpa: 100, stressRange: 'OC' as const, cvM2PerYear: 2, secondaryCompressionIndex: 0.02 },
  { stressFromKpa: 100, stressToKpa: 200, stressRange: 'NC' as const, cvM2PerYear: 1, secondaryCompressionIndex: 0.03 },
];

async function rowsFor(viewer: string | null, scope: TenantScope): Promise<SelectionRow[]> {
  return inTenantTransaction(db, scope, async (trx) => {
    const rows: SelectionRow[] = [];
    for await (const row of streamSelectionRows(trx, { unit: [unitSlug] }, viewer, SECRET, 2)) rows.push(row);
    return rows;
  });
}

beforeAll(async () => {
  for (const id of [firmId, otherFirmId]) {
    await sql`insert into "organization" (id, name, slug, "createdAt") values (${id}, ${`${id} (invented)`}, ${id}, now())`.execute(
      db,
    );
  }
  const region = await db.selectFrom('region').select('id').where('slug', '=', 'saltreach-estuary').executeTakeFirstOrThrow();
  const unit = await inTenantTransaction(db, steward, (trx) =>
    trx
      .insertInto('geological_unit')
      .values({ name: `Statistics test clay ${tag} (invented)`, slug: unitSlug, genesis: 'estuarine' })
      .returning('id')
      .executeTakeFirstOrThrow(),
  );
  await inTenantTransaction(db, firm, async (trx) => {
    const submission = await trx
      .insertInto('submission')
      .values({ firm_id: firmId, source_kind: 'seed', status: 'submitted', submitted_at: new Date() })
      .returning('id')
      .executeTakeFirstOrThrow();
    const base = {
      submission_id: submission.id,
      firm_id: firmId,
      region_id: region.id,
      geological_unit_id: unit.id,
      uscs_symbol: 'CH' as const,
    };
    for (const [name, depth, extra] of [
      [
        'levels',
        4,
        { preconsolidation_stress_kpa: 100, cv_nc_m2_per_year: 9, cv_oc_m2_per_year: 90, secondary_compression_index: 0.5 },
      ],
      ['summary', 6, { cv_nc_m2_per_year: 1.5, cv_oc_m2_per_year: 8, secondary_compression_index: 0.03 }],
      ['pending', 8, { compression_index: 0.8 }],
    ] as const) {
      const row = await trx
        .insertInto('test_record')
        .values({ ...base, depth_top_m: depth, depth_bottom_m: depth + 0.4, compression_index: 0.7, ...extra })
        .returning('id')
        .executeTakeFirstOrThrow();
      recordIds[name] = row.id;
    }
    await trx
      .insertInto('test_record_stress_level')
      .values(
        LEVELS.map((l) => ({
          test_record_id: recordIds.levels as string,
          stress_from_kpa: l.stressFromKpa,
          stress_to_kpa: l.stressToKpa,
          stress_range: l.stressRange,
          cv_m2_per_year: l.cvM2PerYear,
          secondary_compression_index: l.secondaryCompressionIndex,
        })),
      )
      .execute();
  });
  await inTenantTransaction(db, steward, async (trx) => {
    const version = await trx
      .insertInto('bank_version')
      .values({ note: 'statistics db test' })
      .returning('id')
      .executeTakeFirstOrThrow();
    await trx
      .updateTable('test_record')
      .set({ status: 'published', bank_version_id: version.id })
      .where('id', 'in', [recordIds.levels as string, recordIds.summary as string])
      .execute();
  });
});

afterAll(async () => {
  await runtime.close();
  await app.db.destroy();
});

describe('rows of a selection', () => {
  it('carry masking keys from PostgreSQL equal to HMAC-SHA-256 computed in Node', async () => {
    const rows = await rowsFor(firmId, firm);
    expect(rows).toHaveLength(3);
    const byDepth = new Map(rows.map((r) => [r.depthTopM, r]));
    for (const [name, depth] of [
      ['levels', 4],
      ['summary', 6],
      ['pending', 8],
    ] as const) {
      // source: RFC 2104 (HMAC), FIPS 180-4 (SHA-256): the same function in both places
      expect((byDepth.get(depth)?.recordKey as number) >>> 0).toBe(recordKeyOf(SECRET, recordIds[name] as string));
    }
  });

  it("split cv and Cα into NC and OC from the stress levels exactly as the core's splitByStressRange", async () => {
    const rows = await rowsFor(firmId, firm);
    const withLevels = rows.find((r) => r.depthTopM === 4) as SelectionRow;
    const expected = splitByStressRange(LEVELS, 100);
    expect(withLevels.cvNcM2PerYear).toBeCloseTo(expected.cvNcM2PerYear as number, 9);
    expect(withLevels.cvOcM2PerYear).toBeCloseTo(expected.cvOcM2PerYear as number, 9);
    expect(withLevels.secondaryCompressionIndexNc).toBeCloseTo(expected.secondaryCompressionIndexNc as number, 9);
    expect(withLevels.secondaryCompressionIndexOc).toBeCloseTo(expected.secondaryCompressionIndexOc as number, 9);
    // geometric mean of the two NC levels' cv (2 and 1 m²/yr): √2
    expect(withLevels.cvNcM2PerYear).toBeCloseTo(Math.SQRT2, 9);
  });

  it('fall back to the summary columns for a test without stress levels', async () => {
    const rows = await rowsFor(firmId, firm);
    const summary = rows.find((r) => r.depthTopM === 6) as SelectionRow;
    expect(summary.cvNcM2PerYear).toBe(1.5);
    expect(summary.cvOcM2PerYear).toBe(8);
    expect(summary.secondaryCompressionIndexNc).toBe(0.03);
    expect(summary.secondaryCompressionIndexOc).toBeNull();
  });

  it("hold another firm's published records but never its unpublished ones", async () => {
    const seenByOther = await rowsFor(otherFirmId, { firmId: otherFirmId, platformRole: 'user' });
    expect(seenByOther.map((r) => r.depthTopM).sort()).toEqual([4, 6]);
    const seenBySteward = await rowsFor(null, steward);
    expect(seenBySteward.map((r) => r.depthTopM).sort()).toEqual([4, 6]);
  });
});

describe('the bank-wide disclosure rule', () => {
  it('is the default without a stored row, and the stored setting when there is one', async () => {
    const read = () => inTenantTransaction(db, steward, (trx) => readDisclosureRule(trx));
    const before = await db.selectFrom('app_setting').select('value').where('key', '=', 'disclosure_rule').executeTakeFirst();
    await db.deleteFrom('app_setting').where('key', '=', 'disclosure_rule').execute();
    try {
      expect(await read()).toEqual({ minTests: 5, minFirms: 2, maxFirmShare: 0.75 });
      await db
        .insertInto('app_setting')
        .values({ key: 'disclosure_rule', value: JSON.stringify({ minTests: 8, minFirms: 3, maxFirmSharePct: 60 }) })
        .execute();
      expect(await read()).toEqual({ minTests: 8, minFirms: 3, maxFirmShare: 0.6 });
      await db
        .updateTable('app_setting')
        .set({ value: JSON.stringify({ minTests: 1 }) })
        .where('key', '=', 'disclosure_rule')
        .execute();
      expect(await read()).toEqual({ minTests: 5, minFirms: 2, maxFirmShare: 0.75 });
    } finally {
      await db.deleteFrom('app_setting').where('key', '=', 'disclosure_rule').execute();
      if (before)
        await db
          .insertInto('app_setting')
          .values({ key: 'disclosure_rule', value: JSON.stringify(before.value) })
          .execute();
    }
  });
});

describe('the service', () => {
  it('answers from the worker, then from the cache until the bank changes', async () => {
    const first = await selectionOverview({ db }, runtime, identityOf(firmId), { unit: [unitSlug] }, {});
    const answer = JSON.parse(first) as {
      basis: { tests: number };
      summaries: { parameter: string; pooled: { released: boolean }; own: { n: number } | null }[];
    };
    expect(answer.basis.tests).toBe(3);
    const cc = answer.summaries.find((s) => s.parameter === 'compressionIndex');
    expect(cc?.pooled.released).toBe(false);
    expect(cc?.own?.n).toBe(3);
    const entries = runtime.cache.stats().entries;
    expect(await selectionOverview({ db }, runtime, identityOf(firmId), { unit: [unitSlug] }, {})).toBe(first);
    expect(runtime.cache.stats().entries).toBe(entries);
    await inTenantTransaction(db, firm, (trx) =>
      trx
        .updateTable('test_record')
        .set({ compression_index: 0.95, updated_at: new Date() })
        .where('id', '=', recordIds.pending as string)
        .execute(),
    );
    const changed = await selectionOverview({ db }, runtime, identityOf(firmId), { unit: [unitSlug] }, {});
    expect(changed).not.toBe(first);
    expect(runtime.cache.stats().entries).toBe(entries + 1);
  });
});
