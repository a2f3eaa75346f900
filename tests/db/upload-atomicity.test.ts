// A submission is stored whole or not at all, whatever happens while it is being stored: the database
// stopped without a clean shutdown, or the app process killed. Afterwards there are 0 half-stored rows,
// and sending the same upload again stores it exactly once.
// source: PostgreSQL 15 documentation §13 (transactions are atomic; an uncommitted transaction leaves
// no trace after crash recovery); OWASP ASVS 5.0 §2.3.3.
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import type { Kysely } from 'kysely';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeSubmission } from '../../src/lib/server/contribute/store-submission';
import { connectDatabase } from '../../src/lib/server/db/connect';
import type { Database } from '../../src/lib/server/db/schema';
import { ConflictError } from '../../src/lib/server/errors';
import { scratchCluster } from './support/scratch-cluster';
import { manyRecords, minimalBank } from './support/store-fixture';

const ROWS = 40_000;
const app = (db: Kysely<Database>) => ({ db, appUrl: 'http://127.0.0.1:4321' });
let cluster: Awaited<ReturnType<typeof scratchCluster>>;
let bank: Awaited<ReturnType<typeof minimalBank>>;

/** Row counts of everything an upload writes, read as superuser (so row-level security hides nothing). */
async function counts(): Promise<Record<string, number>> {
  const client = new pg.Client({ connectionString: cluster.urls.superUrl });
  await client.connect();
  const tables = [
    'submission',
    'submission_file',
    'test_record',
    'test_record_private',
    'oedometer_increment',
    'submission_event',
  ];
  const out: Record<string, number> = {};
  for (const table of tables) out[table] = Number((await client.query(`select count(*) from ${table}`)).rows[0].count);
  await client.end();
  return out;
}

/** Waits until the bulk insert of test records is running in the database. */
async function storingHasBegun(): Promise<void> {
  const client = new pg.Client({ connectionString: cluster.urls.superUrl });
  await client.connect();
  try {
    for (let i = 0; i < 400; i++) {
      const { rows } = await client.query(
        "select 1 from pg_stat_activity where query like 'insert into test_record%' or query like 'insert into test_record_private%'",
      );
      if (rows.length) return;
      await new Promise((r) => setTimeout(r, 10));
    }
    throw new Error('the store never reached the bulk insert');
  } finally {
    await client.end();
  }
}

/** Waits until no connection of the app role is left (the killed process's backend has ended). */
async function appBackendsGone(): Promise<void> {
  const client = new pg.Client({ connectionString: cluster.urls.superUrl });
  await client.connect();
  try {
    for (let i = 0; i < 600; i++) {
      const { rows } = await client.query("select 1 from pg_stat_activity where usename = 'claybank_app'");
      if (rows.length === 0) return;
      await new Promise((r) => setTimeout(r, 50));
    }
    throw new Error('the killed process still has a connection after 30 s');
  } finally {
    await client.end();
  }
}

const source = (label: string) => {
  const bytes = new TextEncoder().encode(`upload ${label}`);
  return {
    kind: 'csv' as const,
    name: `${label}.csv`,
    mediaType: 'text/csv',
    bytes,
    sha256: createHash('sha256').update(bytes).digest('hex'),
  };
};

function expectWholeOrAbsent(found: Record<string, number>, submissions: number) {
  // Either nothing of the interrupted upload, or all of it: never part.
  const perSubmission = {
    submission: 1,
    submission_file: 1,
    test_record: ROWS,
    test_record_private: ROWS,
    oedometer_increment: 3 * ROWS,
    submission_event: 1,
  };
  for (const [table, n] of Object.entries(perSubmission))
    expect(found[table], `${table} in ${JSON.stringify(found)}`).toBe(n * submissions);
}

beforeAll(async () => {
  cluster = await scratchCluster();
  const { db } = connectDatabase(cluster.urls.appUrl, { max: 2 });
  bank = await minimalBank(db);
  await db.destroy();
}, 120_000);

afterAll(() => cluster?.destroy());

describe('a submission is whole or absent', () => {
  it('when the database is stopped in the middle of storing it', async () => {
    const { db, pool } = connectDatabase(cluster.urls.appUrl, { max: 1 });
    const contributor = { userId: bank.userId, firmId: bank.firmId, ipAddress: null, via: 'seed' as const };
    const storing = storeSubmission(app(db), contributor, source('stopped'), manyRecords(ROWS, bank.regionId, bank.unitId));
    const outcome = storing.then(
      () => 'stored',
      (error: Error) => `failed: ${error.message}`,
    );
    await storingHasBegun();
    cluster.crash();
    expect(await outcome).toMatch(/^failed/);
    await pool.end().catch(() => {});
    await cluster.restart();
    expectWholeOrAbsent(await counts(), 0);
  }, 120_000);

  it('when the app process is killed in the middle of storing it', async () => {
    const child = spawn(process.execPath, [join(import.meta.dirname, 'support/run-store-child.mjs')], {
      env: {
        ...process.env,
        SCRATCH_APP_URL: cluster.urls.appUrl,
        FIRM_ID: bank.firmId,
        USER_ID: bank.userId,
        REGION_ID: bank.regionId,
        UNIT_ID: bank.unitId,
        ROWS: String(ROWS),
        LABEL: 'killed',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const exited = new Promise<number | null>((resolve) => child.once('exit', (code, signal) => resolve(signal ? null : code)));
    await storingHasBegun();
    child.kill('SIGKILL');
    expect(await exited).toBeNull();

    // The server notices the lost connection when the running statement ends, and rolls back.
    await appBackendsGone();
    expectWholeOrAbsent(await counts(), 0);
  }, 120_000);

  it('and the same upload sent again afterwards is stored exactly once', async () => {
    const { db } = connectDatabase(cluster.urls.appUrl, { max: 1 });
    const contributor = { userId: bank.userId, firmId: bank.firmId, ipAddress: null, via: 'seed' as const };
    const records = manyRecords(ROWS, bank.regionId, bank.unitId);
    await storeSubmission(app(db), contributor, source('stopped'), records);
    await expect(storeSubmission(app(db), contributor, source('stopped'), records)).rejects.toThrow(ConflictError);
    await db.destroy();
    const client = new pg.Client({ connectionString: cluster.urls.superUrl });
    await client.connect();
    expect((await client.query('select source_file_name from submission')).rows).toEqual([{ source_file_name: 'stopped.csv' }]);
    await client.end();
    expectWholeOrAbsent(await counts(), 1);
  }, 120_000);
});
