import { createHash, randomUUID } from 'node:crypto';
import { type Kysely, sql, type Transaction } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BankTables, NewTestRecord } from '../../src/lib/server/db/bank-tables';
import { connectDatabase } from '../../src/lib/server/db/connect';
import type { Database } from '../../src/lib/server/db/schema';
import { inTenantTransaction } from '../../src/lib/server/tenancy/tenant-transaction';
import { testEnv } from '../support/env';

type BankDatabase = Database & BankTables;
type Scope = { firmId?: string; platformRole?: 'admin' | 'steward' | 'user' };

const PRIVATE_TABLES = ['test_record_private', 'submission_file', 'estimate', 'field_mapping'] as const;
const SCOPED_TABLES = [
  'submission',
  'submission_event',
  'test_record',
  'test_record_stress_level',
  'oedometer_increment',
  'oedometer_reading',
] as const;
/** Tables with a firm_id column that deliberately have no row-level security, and why. */
const FIRM_TABLES_WITHOUT_RLS: Record<string, string> = {
  audit_log: 'append-only log read by the app for one firm at a time; never exposed as a table',
};
const PUBLIC_OR_INTERNAL_TABLES = ['region', 'geological_unit', 'bank_version', 'search_outbox', 'mail_outbox', 'audit_log'];

const app = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 3 });
const db = app.db as unknown as Kysely<BankDatabase>;

/** A transaction with the row-level-security context the app sets (the app's own helper). */
function within<T>(scope: Scope, fn: (trx: Transaction<BankDatabase>) => Promise<T>): Promise<T> {
  return inTenantTransaction(app.db, { firmId: scope.firmId ?? null, platformRole: scope.platformRole ?? null }, fn);
}

async function countRows(executor: Kysely<BankDatabase>, table: string, where = sql`true`): Promise<number> {
  const { rows } = await sql<{ n: number }>`select count(*)::int as n from ${sql.table(table)} where ${where}`.execute(executor);
  return rows[0]?.n ?? -1;
}

const tag = randomUUID().slice(0, 8);
const firmA = `tenancy-a-${tag}`;
const firmB = `tenancy-b-${tag}`;
const userId = `tenancy-user-${tag}`;
const A: Scope = { firmId: firmA };
const B: Scope = { firmId: firmB };
const steward: Scope = { platformRole: 'steward' };
const admin: Scope = { platformRole: 'admin' };
const nobody: Scope = {};

const ids = { region: '', unit: '', version: 0, submissionA: '', submissionB: '', unpublishedA: '', publishedA: '', recordB: '' };

async function seedFirm(trx: Transaction<BankDatabase>, firmId: string, submissionStatus: 'submitted' | 'draft') {
  const submission = await trx
    .insertInto('submission')
    .values({ firm_id: firmId, submitted_by: userId, source_kind: 'csv', status: submissionStatus })
    .returning('id')
    .executeTakeFirstOrThrow();
  await trx
    .insertInto('submission_event')
    .values({ submission_id: submission.id, actor_user_id: userId, to_status: submissionStatus })
    .execute();
  const content = Buffer.from(`project,borehole\n${firmId},BH-1\n`);
  await trx
    .insertInto('submission_file')
    .values({
      submission_id: submission.id,
      firm_id: firmId,
      storage_name: `${randomUUID()}.csv`,
      original_name: 'upload.csv',
      media_type: 'text/csv',
      size_bytes: content.length,
      sha256: createHash('sha256').update(content).digest('hex'),
      content,
    })
    .execute();
  await trx
    .insertInto('estimate')
    .values({ firm_id: firmId, name: 'Fill on clay', input: JSON.stringify({ loadKpa: 50 }) })
    .execute();
  await trx
    .insertInto('field_mapping')
    .values({ firm_id: firmId, name: 'lab sheet', mapping: JSON.stringify({ depthTopM: 'Top' }) })
    .execute();
  return submission.id;
}

async function addRecord(
  trx: Transaction<BankDatabase>,
  firmId: string,
  submissionId: string,
  values: Partial<NewTestRecord> = {},
) {
  const { id } = await trx
    .insertInto('test_record')
    .values({
      submission_id: submissionId,
      firm_id: firmId,
      region_id: ids.region,
      geological_unit_id: ids.unit,
      depth_top_m: 3,
      depth_bottom_m: 3.25,
      compression_index: 0.6,
      ...values,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  await trx
    .insertInto('test_record_private')
    .values({ test_record_id: id, firm_id: firmId, client_name: `client of ${firmId}` })
    .execute();
  await trx
    .insertInto('test_record_stress_level')
    .values({ test_record_id: id, stress_from_kpa: 100, stress_to_kpa: 200, stress_range: 'NC', cv_m2_per_year: 1 })
    .execute();
  const increment = await trx
    .insertInto('oedometer_increment')
    .values({ test_record_id: id, increment_no: 1, applied_stress_kpa: 25 })
    .returning('id')
    .executeTakeFirstOrThrow();
  await trx
    .insertInto('oedometer_reading')
    .values({ increment_id: increment.id, elapsed_minutes: 1, deformation_mm: 0.05 })
    .execute();
  return id;
}

beforeAll(async () => {
  await sql`insert into "user" (id, name, email, "emailVerified", "createdAt", "updatedAt")
            values (${userId}, 'Tenancy tester', ${`${userId}@example.test`}, true, now(), now())`.execute(db);
  for (const firm of [firmA, firmB]) {
    await sql`insert into "organization" (id, name, slug, "createdAt") values (${firm}, ${firm}, ${firm}, now())`.execute(db);
  }
  ids.region = (
    await db
      .insertInto('region')
      .values({ name: `Vennmoor Flats ${tag}`, slug: `vennmoor-${tag}` })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.unit = (
    await db
      .insertInto('geological_unit')
      .values({ name: `Vennmoor Peat ${tag}`, slug: `vennmoor-peat-${tag}`, genesis: 'organic' })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;
  ids.version = (
    await db
      .insertInto('bank_version')
      .values({ note: `tenancy ${tag}` })
      .returning('id')
      .executeTakeFirstOrThrow()
  ).id;

  await within(A, async (trx) => {
    ids.submissionA = await seedFirm(trx, firmA, 'submitted');
    ids.unpublishedA = await addRecord(trx, firmA, ids.submissionA);
    ids.publishedA = await addRecord(trx, firmA, ids.submissionA, { compression_index: 0.75 });
  });
  await within(B, async (trx) => {
    ids.submissionB = await seedFirm(trx, firmB, 'draft');
    ids.recordB = await addRecord(trx, firmB, ids.submissionB);
  });
  // Review: the steward accepts A's submission and publishes one of its records.
  await within(steward, async (trx) => {
    await trx
      .updateTable('submission')
      .set({ status: 'accepted', decided_by: userId, decided_at: new Date() })
      .where('id', '=', ids.submissionA)
      .execute();
    await trx
      .updateTable('test_record')
      .set({ status: 'published', bank_version_id: ids.version })
      .where('id', '=', ids.publishedA)
      .execute();
  });
});

afterAll(async () => {
  for (const [scope, firmId] of [
    [A, firmA],
    [B, firmB],
  ] as const) {
    await within(scope, async (trx) => {
      await trx.deleteFrom('test_record').where('firm_id', '=', firmId).execute();
      await trx.deleteFrom('submission').where('firm_id', '=', firmId).execute();
      await trx.deleteFrom('estimate').where('firm_id', '=', firmId).execute();
      await trx.deleteFrom('field_mapping').where('firm_id', '=', firmId).execute();
    });
  }
  await db.deleteFrom('bank_version').where('id', '=', ids.version).execute();
  await db.deleteFrom('geological_unit').where('id', '=', ids.unit).execute();
  await db.deleteFrom('region').where('id', '=', ids.region).execute();
  await sql`delete from "organization" where id in (${firmA}, ${firmB})`.execute(db);
  await sql`delete from "user" where id = ${userId}`.execute(db);
  await app.db.destroy();
});

describe('the catalogue', () => {
  it('connects the app as a role that is not superuser, has no BYPASSRLS and owns no table', async () => {
    const { rows } = await sql<{ rolsuper: boolean; rolbypassrls: boolean; owned: number }>`
      select r.rolsuper, r.rolbypassrls,
             (select count(*)::int from pg_class c where c.relowner = r.oid and c.relkind in ('r', 'p', 'v', 'm')) as owned
      from pg_roles r where r.rolname = current_user`.execute(db);
    expect(rows).toEqual([{ rolsuper: false, rolbypassrls: false, owned: 0 }]);
  });

  async function rowSecurity(): Promise<Map<string, { rls: boolean; force: boolean }>> {
    const { rows } = await sql<{ name: string; rls: boolean; force: boolean }>`
      select relname as name, relrowsecurity as rls, relforcerowsecurity as force
      from pg_class where relnamespace = 'public'::regnamespace and relkind = 'r'`.execute(db);
    return new Map(rows.map((row) => [row.name, { rls: row.rls, force: row.force }]));
  }

  it.each([...PRIVATE_TABLES, ...SCOPED_TABLES])('has forced row-level security on %s', async (table) => {
    expect((await rowSecurity()).get(table)).toEqual({ rls: true, force: true });
  });

  it('has forced row-level security on every table with a firm_id column', async () => {
    const { rows } = await sql<{ table_name: string }>`
      select c.relname as table_name from pg_attribute a join pg_class c on c.oid = a.attrelid
      where c.relnamespace = 'public'::regnamespace and c.relkind in ('r', 'p')
        and a.attname = 'firm_id' and not a.attisdropped order by 1`.execute(db);
    const firmTables = rows.map((row) => row.table_name);
    expect(firmTables).toEqual(expect.arrayContaining([...PRIVATE_TABLES, 'submission', 'test_record']));
    const security = await rowSecurity();
    const unguarded = firmTables.filter(
      (table) => !(table in FIRM_TABLES_WITHOUT_RLS) && !(security.get(table)?.rls && security.get(table)?.force),
    );
    expect(unguarded).toEqual([]);
  });

  it('keeps vocabulary, versions, outboxes and the audit log free of row-level security', async () => {
    const security = await rowSecurity();
    expect(PUBLIC_OR_INTERNAL_TABLES.map((table) => [table, security.get(table)?.rls])).toEqual(
      PUBLIC_OR_INTERNAL_TABLES.map((table) => [table, false]),
    );
  });

  it('guards each firm-private table with one policy for all commands, keyed on the transaction firm', async () => {
    const { rows } = await sql<{ tablename: string; cmd: string; qual: string; with_check: string }>`
      select tablename, cmd, qual, with_check from pg_policies
      where schemaname = 'public' and tablename in (${sql.join([...PRIVATE_TABLES])}) order by tablename`.execute(db);
    expect(rows.map((row) => row.tablename)).toEqual([...PRIVATE_TABLES].sort());
    for (const row of rows) {
      expect(row.cmd).toBe('ALL');
      expect(row.qual).toBe(row.with_check);
      expect(row.qual).toMatch(/firm_id = NULLIF\(current_setting\('app\.firm_id'::text, true\), ''::text\)/);
    }
  });
});

describe('firm-private tables', () => {
  it('show rows to their own firm only', async () => {
    for (const [scope, firmId] of [
      [A, firmA],
      [B, firmB],
    ] as const) {
      const firms = await within(scope, async (trx) => {
        const seen = new Set<string>();
        for (const table of PRIVATE_TABLES) {
          const { rows } = await sql<{ firm_id: string }>`select distinct firm_id from ${sql.table(table)}`.execute(trx);
          expect(rows.length, `${table} as ${firmId}`).toBe(1);
          for (const row of rows) seen.add(row.firm_id);
        }
        return [...seen];
      });
      expect(firms).toEqual([firmId]);
    }
  });

  it('show nothing without a firm, outside a transaction, with an empty firm, or to a steward or admin', async () => {
    const counts = async (executor: Kysely<BankDatabase>) =>
      Promise.all(PRIVATE_TABLES.map((table) => countRows(executor, table)));
    const zero = PRIVATE_TABLES.map(() => 0);
    expect(await within(A, (trx) => counts(trx))).toEqual([2, 1, 1, 1]);
    expect(await counts(db)).toEqual(zero);
    expect(await within(nobody, (trx) => counts(trx))).toEqual(zero);
    expect(await within(steward, (trx) => counts(trx))).toEqual(zero);
    expect(await within(admin, (trx) => counts(trx))).toEqual(zero);
  });

  it('refuse a row written for another firm, or with no firm set', async () => {
    const insertFor = (scope: Scope) =>
      within(scope, (trx) =>
        trx
          .insertInto('test_record_private')
          .values({ test_record_id: ids.unpublishedA, firm_id: firmA, notes: 'written by someone else' })
          .execute(),
      );
    await expect(insertFor(B)).rejects.toThrow(/row-level security policy for table "test_record_private"/);
    await expect(insertFor(nobody)).rejects.toThrow(/row-level security policy/);
    await expect(insertFor(steward)).rejects.toThrow(/row-level security policy/);
    await expect(
      within(B, (trx) => trx.insertInto('field_mapping').values({ firm_id: firmA, name: 'stolen', mapping: '{}' }).execute()),
    ).rejects.toThrow(/row-level security policy for table "field_mapping"/);
  });

  it('cannot be changed or deleted by another firm', async () => {
    const result = await within(B, async (trx) => ({
      updated: await trx.updateTable('estimate').set({ name: 'renamed by B' }).where('firm_id', '=', firmA).executeTakeFirst(),
      deleted: await trx.deleteFrom('test_record_private').where('firm_id', '=', firmA).executeTakeFirst(),
    }));
    expect(result.updated.numUpdatedRows).toBe(0n);
    expect(result.deleted.numDeletedRows).toBe(0n);
    expect(await within(A, (trx) => countRows(trx, 'estimate', sql`name = 'Fill on clay'`))).toBe(1);
  });
});

describe('the tenant context', () => {
  it('ends with its transaction, so the next use of a pooled connection sees no firm', async () => {
    const single = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 1 });
    const solo = single.db as unknown as Kysely<BankDatabase>;
    const backend = async (executor: Kysely<BankDatabase>) =>
      (
        await sql<{
          pid: number;
          firm: string | null;
        }>`select pg_backend_pid() as pid, current_setting('app.firm_id', true) as firm`.execute(executor)
      ).rows[0];
    try {
      const inside = await solo.transaction().execute(async (trx) => {
        await sql`select set_config('app.firm_id', ${firmA}, true)`.execute(trx);
        return { ...(await backend(trx)), rows: await countRows(trx, 'test_record_private') };
      });
      const after = { ...(await backend(solo)), rows: await countRows(solo, 'test_record_private') };
      expect(inside).toMatchObject({ firm: firmA, rows: 2 });
      expect(after).toEqual({ pid: inside.pid, firm: '', rows: 0 });

      // The contrast: a session-level setting would outlive the transaction on the same connection.
      await sql`select set_config('app.firm_id', ${firmA}, false)`.execute(solo);
      const leaked = { ...(await backend(solo)), rows: await countRows(solo, 'test_record_private') };
      expect(leaked).toEqual({ pid: inside.pid, firm: firmA, rows: 2 });
    } finally {
      await single.db.destroy();
    }
  });
});

describe('test records and their children', () => {
  const childCounts = (executor: Kysely<BankDatabase>, recordId: string) =>
    Promise.all([
      countRows(executor, 'test_record', sql`id = ${recordId}`),
      countRows(executor, 'test_record_stress_level', sql`test_record_id = ${recordId}`),
      countRows(executor, 'oedometer_increment', sql`test_record_id = ${recordId}`),
      countRows(
        executor,
        'oedometer_reading',
        sql`increment_id in (select id from oedometer_increment where test_record_id = ${recordId})`,
      ),
    ]);

  it.each([
    ['firm A (owner)', A, [1, 1, 1, 1]],
    ['a steward', steward, [1, 1, 1, 1]],
    ['an admin', admin, [1, 1, 1, 1]],
    ['firm B', B, [0, 0, 0, 0]],
    ['no firm', nobody, [0, 0, 0, 0]],
  ] as const)('an unpublished record of firm A, as %s', async (_label, scope, expected) => {
    expect(await within(scope, (trx) => childCounts(trx, ids.unpublishedA))).toEqual(expected);
  });

  it.each([
    ['firm A (owner)', A],
    ['firm B', B],
    ['no firm', nobody],
    ['a steward', steward],
  ] as const)('a published record of firm A and its children, as %s', async (_label, scope) => {
    expect(await within(scope, (trx) => childCounts(trx, ids.publishedA))).toEqual([1, 1, 1, 1]);
  });

  it('shows a published record outside any transaction too, but never its private row', async () => {
    expect(await childCounts(db, ids.publishedA)).toEqual([1, 1, 1, 1]);
    expect(await childCounts(db, ids.unpublishedA)).toEqual([0, 0, 0, 0]);
    expect(await within(B, (trx) => countRows(trx, 'test_record_private', sql`test_record_id = ${ids.publishedA}`))).toBe(0);
  });

  it('cannot be changed or deleted by another firm, published or not (0 rows affected)', async () => {
    const attempt = await within(B, async (trx) => {
      const targets = [ids.unpublishedA, ids.publishedA];
      return {
        records: (
          await trx.updateTable('test_record').set({ compression_index: 9 }).where('id', 'in', targets).executeTakeFirst()
        ).numUpdatedRows,
        levels: (
          await trx
            .updateTable('test_record_stress_level')
            .set({ cv_m2_per_year: 99 })
            .where('test_record_id', 'in', targets)
            .executeTakeFirst()
        ).numUpdatedRows,
        // Every fixture reading has this deformation; B's delete reaches only B's own one.
        readings: (await trx.deleteFrom('oedometer_reading').where('deformation_mm', '=', 0.05).executeTakeFirst())
          .numDeletedRows,
        deleted: (await trx.deleteFrom('test_record').where('id', 'in', targets).executeTakeFirst()).numDeletedRows,
      };
    });
    expect(attempt).toEqual({ records: 0n, levels: 0n, readings: 1n, deleted: 0n });
    const after = await within(A, (trx) =>
      trx
        .selectFrom('test_record')
        .select(['id', 'compression_index'])
        .where('firm_id', '=', firmA)
        .orderBy('compression_index')
        .execute(),
    );
    expect(after).toEqual([
      { id: ids.unpublishedA, compression_index: 0.6 },
      { id: ids.publishedA, compression_index: 0.75 },
    ]);
    expect(await within(A, (trx) => countRows(trx, 'oedometer_reading'))).toBe(2);
  });

  it('cannot be written into another firm, nor attached to its submission or records', async () => {
    await expect(within(B, (trx) => addRecord(trx, firmA, ids.submissionA))).rejects.toThrow(
      /row-level security policy for table "test_record"/,
    );
    await expect(within(B, (trx) => addRecord(trx, firmB, ids.submissionA))).rejects.toThrow(/test_record_submission_same_firm/);
    await expect(
      within(B, (trx) =>
        trx
          .insertInto('test_record_stress_level')
          .values({ test_record_id: ids.publishedA, stress_from_kpa: 1, stress_to_kpa: 2, stress_range: 'OC' })
          .execute(),
      ),
    ).rejects.toThrow(/row-level security policy for table "test_record_stress_level"/);
  });

  it('cannot be published by its own firm; the steward publishes', async () => {
    await expect(
      within(A, (trx) =>
        trx
          .updateTable('test_record')
          .set({ status: 'published', bank_version_id: ids.version })
          .where('id', '=', ids.unpublishedA)
          .execute(),
      ),
    ).rejects.toThrow(/row-level security policy for table "test_record"/);
    const review = await within(steward, async (trx) => ({
      returned: (
        await trx.updateTable('test_record').set({ status: 'returned' }).where('id', '=', ids.unpublishedA).executeTakeFirst()
      ).numUpdatedRows,
      deleted: (await trx.deleteFrom('test_record').where('id', '=', ids.unpublishedA).executeTakeFirst()).numDeletedRows,
    }));
    expect(review).toEqual({ returned: 1n, deleted: 0n });
    const reset = await within(A, (trx) =>
      trx.updateTable('test_record').set({ status: 'pending' }).where('id', '=', ids.unpublishedA).executeTakeFirst(),
    );
    expect(reset.numUpdatedRows).toBe(1n);
  });

  it('are not updated by an admin, and no steward can move a record to another firm', async () => {
    const byAdmin = await within(admin, (trx) =>
      trx.updateTable('test_record').set({ status: 'rejected' }).where('id', '=', ids.unpublishedA).executeTakeFirst(),
    );
    expect(byAdmin.numUpdatedRows).toBe(0n);
    await expect(
      within(steward, (trx) => trx.updateTable('submission').set({ firm_id: firmB }).where('id', '=', ids.submissionA).execute()),
    ).rejects.toThrow(/firm_id of submission cannot change/);
  });
});

describe('submissions', () => {
  it('are seen by their firm and by stewards and admins, never by another firm, even when accepted', async () => {
    const seen = async (scope: Scope) =>
      within(scope, async (trx) => ({
        submission: await countRows(trx, 'submission', sql`id = ${ids.submissionA}`),
        events: await countRows(trx, 'submission_event', sql`submission_id = ${ids.submissionA}`),
      }));
    expect(
      await within(A, (trx) =>
        trx.selectFrom('submission').select('status').where('id', '=', ids.submissionA).executeTakeFirst(),
      ),
    ).toEqual({
      status: 'accepted',
    });
    expect(await seen(A)).toEqual({ submission: 1, events: 1 });
    expect(await seen(steward)).toEqual({ submission: 1, events: 1 });
    expect(await seen(admin)).toEqual({ submission: 1, events: 1 });
    expect(await seen(B)).toEqual({ submission: 0, events: 0 });
    expect(await seen(nobody)).toEqual({ submission: 0, events: 0 });
  });

  it('cannot be accepted by their own firm, and their history cannot be rewritten', async () => {
    await expect(
      within(B, (trx) => trx.updateTable('submission').set({ status: 'accepted' }).where('id', '=', ids.submissionB).execute()),
    ).rejects.toThrow(/row-level security policy for table "submission"/);
    const rewrite = await within(B, async (trx) => ({
      updated: (
        await trx
          .updateTable('submission_event')
          .set({ comment: 'rewritten' })
          .where('submission_id', '=', ids.submissionB)
          .executeTakeFirst()
      ).numUpdatedRows,
      deleted: (await trx.deleteFrom('submission_event').where('submission_id', '=', ids.submissionB).executeTakeFirst())
        .numDeletedRows,
      visible: await countRows(trx, 'submission_event', sql`submission_id = ${ids.submissionB}`),
    }));
    expect(rewrite).toEqual({ updated: 0n, deleted: 0n, visible: 1 });
    await expect(
      within(B, (trx) =>
        trx.insertInto('submission_event').values({ submission_id: ids.submissionA, to_status: 'withdrawn' }).execute(),
      ),
    ).rejects.toThrow(/row-level security policy for table "submission_event"/);
  });
});
