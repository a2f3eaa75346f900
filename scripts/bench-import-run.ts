// The measuring half of `npm run bench:import` (scripts/bench-import.mjs sets up the database).
import { spawnSync } from 'node:child_process';
import { createHash, randomUUID } from 'node:crypto';
import { sql } from 'kysely';
import Papa from 'papaparse';
import { prepareUpload } from '../src/lib/server/contribute/prepare-upload';
import { storeSubmission } from '../src/lib/server/contribute/store-submission';
import { connectDatabase } from '../src/lib/server/db/connect';
import { uuidV7 } from '../src/lib/server/db/uuid-v7';

const ROWS = 100_000;
const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const app = connectDatabase(process.env.BENCH_APP_URL ?? '', { max: 2 });
const owner = connectDatabase(process.env.BENCH_OWNER_URL ?? '', { max: 1 });
const superuser = connectDatabase(process.env.BENCH_SUPER_URL ?? '', { max: 1 });

const HEADER = [
  'Project name',
  'Borehole',
  'Sample',
  'Easting (m)',
  'Northing (m)',
  'Notes',
  'Region',
  'Geological unit',
  'Depth top (m)',
  'Depth bottom (m)',
  'USCS',
  'wn (%)',
  'LL (%)',
  'PL (%)',
  'e0',
  'Cc',
  'Cr',
  "σ'p (kPa)",
  "σ'v0 (kPa)",
  'cv NC (m²/yr)',
  'Δe/e0',
];

function makeCsv(run: number): string {
  const lines = [HEADER.join(',')];
  for (let i = 0; i < ROWS; i++) {
    const depth = 3 + (i % 30) * 0.5;
    const wn = 60 + (i % 37);
    lines.push(
      [
        `Bench project ${run} (invented)`,
        `BB-${run}-${Math.floor(i / 30)}`,
        `U${i % 30}`,
        412000 + (i % 997),
        301000 + (i % 991),
        'invented',
        'Bench Region',
        'Bench Clay',
        depth,
        depth + 0.45,
        'CH',
        wn,
        wn + 5,
        30,
        (wn * 2.68) / 100,
        0.009 * (wn - 10),
        0.09,
        20 + 8 * depth,
        8 * depth,
        1.2,
        0.03,
      ].join(','),
    );
  }
  return lines.join('\n');
}

async function setUp() {
  const userId = randomUUID();
  const firmId = randomUUID();
  await app.db
    .insertInto('user')
    .values({
      id: userId,
      name: 'Bench person (invented)',
      email: `${userId}@example.test`,
      emailVerified: true,
      createdAt: new Date(),
      updatedAt: new Date(),
      role: 'user',
      image: null,
      banned: null,
      banReason: null,
      banExpires: null,
    })
    .execute();
  await app.db
    .insertInto('organization')
    .values({
      id: firmId,
      name: 'Bench firm (invented)',
      slug: `bench-${firmId}`,
      createdAt: new Date(),
      logo: null,
      metadata: null,
    })
    .execute();
  await app.db.insertInto('region').values({ name: 'Bench Region', slug: 'bench-region', description: null }).execute();
  await app.db.insertInto('geological_unit').values({ name: 'Bench Clay', slug: 'bench-clay', genesis: 'estuarine' }).execute();
  const region = await app.db.selectFrom('region').select('id').executeTakeFirstOrThrow();
  const unit = await app.db.selectFrom('geological_unit').select('id').executeTakeFirstOrThrow();
  await sql`create table bench_floor_shared (depth_top_m numeric, depth_bottom_m numeric, uscs_symbol text, water_content_pct numeric, liquid_limit_pct numeric, plastic_limit_pct numeric, initial_void_ratio numeric, compression_index numeric, recompression_index numeric, preconsolidation_stress_kpa numeric, vertical_effective_stress_kpa numeric, cv_nc_m2_per_year numeric, delta_e_over_e0 numeric, region text, unit text)`.execute(
    owner.db,
  );
  await sql`create table bench_floor_private (project_name text, borehole_id text, sample_id text, easting_m numeric, northing_m numeric, notes text)`.execute(
    owner.db,
  );
  return { userId, firmId, regionId: region.id, unitId: unit.id };
}

async function clear() {
  await sql`truncate submission, submission_file, test_record, test_record_private, oedometer_increment, submission_event, mail_outbox, audit_log, bench_floor_shared, bench_floor_private cascade`.execute(
    owner.db,
  );
}

function psqlCopy(table: string, columns: string[], csv: string, url = process.env.BENCH_OWNER_URL ?? '') {
  const result = spawnSync('psql', [url, '-q', '-c', `\\copy ${table} (${columns.join(', ')}) from stdin with (format csv)`], {
    input: csv,
    encoding: 'utf8',
  });
  if (result.status !== 0) throw new Error(`psql copy failed: ${result.stderr}`);
}

/** The floor: papaparse with the delimiter given, then COPY of the shared and private columns. */
function floor(csv: string): number {
  const started = performance.now();
  const parsed = Papa.parse<string[]>(csv, { delimiter: ',', skipEmptyLines: true });
  const rows = parsed.data.slice(1);
  const shared = Papa.unparse(
    rows.map((r) => [r[8], r[9], r[10], r[11], r[12], r[13], r[14], r[15], r[16], r[17], r[18], r[19], r[20], r[6], r[7]]),
  );
  const own = Papa.unparse(rows.map((r) => [r[0], r[1], r[2], r[3], r[4], r[5]]));
  psqlCopy(
    'bench_floor_shared',
    [
      'depth_top_m',
      'depth_bottom_m',
      'uscs_symbol',
      'water_content_pct',
      'liquid_limit_pct',
      'plastic_limit_pct',
      'initial_void_ratio',
      'compression_index',
      'recompression_index',
      'preconsolidation_stress_kpa',
      'vertical_effective_stress_kpa',
      'cv_nc_m2_per_year',
      'delta_e_over_e0',
      'region',
      'unit',
    ],
    shared,
  );
  psqlCopy('bench_floor_private', ['project_name', 'borehole_id', 'sample_id', 'easting_m', 'northing_m', 'notes'], own);
  return performance.now() - started;
}

/**
 * The second floor: the same rows COPYed into the bank's own tables (their constraints, indexes and
 * foreign keys), as the superuser because COPY cannot run under row-level security.
 */
async function floorIntoBankTables(
  csv: string,
  ids: { userId: string; firmId: string; regionId: string; unitId: string },
): Promise<number> {
  const superUrl = process.env.BENCH_SUPER_URL ?? '';
  const submissionId = randomUUID();
  await sql`insert into submission (id, firm_id, submitted_by, source_kind, status) values (${submissionId}, ${ids.firmId}, ${ids.userId}, 'csv', 'submitted')`.execute(
    superuser.db,
  );
  const started = performance.now();
  const parsed = Papa.parse<string[]>(csv, { delimiter: ',', skipEmptyLines: true });
  const rows = parsed.data.slice(1);
  const recordIds = rows.map(() => uuidV7());
  const shared = Papa.unparse(
    rows.map((r, i) => [
      recordIds[i],
      submissionId,
      ids.firmId,
      ids.regionId,
      ids.unitId,
      r[8],
      r[9],
      r[10],
      r[11],
      r[12],
      r[13],
      r[14],
      r[15],
      r[16],
      r[17],
      r[18],
      r[19],
      r[20],
    ]),
  );
  const own = Papa.unparse(rows.map((r, i) => [recordIds[i], ids.firmId, r[0], r[1], r[2], r[3], r[4], r[5]]));
  psqlCopy(
    'test_record',
    [
      'id',
      'submission_id',
      'firm_id',
      'region_id',
      'geological_unit_id',
      'depth_top_m',
      'depth_bottom_m',
      'uscs_symbol',
      'water_content_pct',
      'liquid_limit_pct',
      'plastic_limit_pct',
      'initial_void_ratio',
      'compression_index',
      'recompression_index',
      'preconsolidation_stress_kpa',
      'vertical_effective_stress_kpa',
      'cv_nc_m2_per_year',
      'delta_e_over_e0',
    ],
    shared,
    superUrl,
  );
  psqlCopy(
    'test_record_private',
    ['test_record_id', 'firm_id', 'project_name', 'borehole_id', 'sample_id', 'easting_m', 'northing_m', 'notes'],
    own,
    superUrl,
  );
  return performance.now() - started;
}

async function ours(
  csv: string,
  ids: { userId: string; firmId: string },
): Promise<{ total: number; prepare: number; store: number }> {
  const bytes = new TextEncoder().encode(csv);
  const started = performance.now();
  const prepared = await prepareUpload(app, ids.firmId, bytes, { format: 'csv' });
  if (!prepared.ok || prepared.errors.length)
    throw new Error(
      `the benchmark file did not pass: ${JSON.stringify(prepared.ok ? prepared.errors.slice(0, 3) : prepared.error)}`,
    );
  const prepare = performance.now() - started;
  await storeSubmission(
    { db: app.db, appUrl: 'http://127.0.0.1:4321' },
    { userId: ids.userId, firmId: ids.firmId, ipAddress: null, via: 'seed' },
    { kind: 'csv', name: 'bench.csv', mediaType: 'text/csv', bytes, sha256: createHash('sha256').update(bytes).digest('hex') },
    prepared.records,
  );
  const total = performance.now() - started;
  return { total, prepare, store: total - prepare };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? Number.NaN;
const ids = await setUp();
const oursRuns: { total: number; prepare: number; store: number }[] = [];
const floorRuns: number[] = [];
const bankFloorRuns: number[] = [];
for (let run = 0; run < RUNS; run++) {
  const csv = makeCsv(run);
  await clear();
  floorRuns.push(floor(csv));
  await clear();
  bankFloorRuns.push(await floorIntoBankTables(csv, ids));
  await clear();
  oursRuns.push(await ours(csv, ids));
}
const oursMs = median(oursRuns.map((r) => r.total));
const floorMs = median(floorRuns);
const bankFloorMs = median(bankFloorRuns);
const ratio = oursMs / floorMs;
console.log(
  `rows: ${ROWS.toLocaleString('en')} (${(new TextEncoder().encode(makeCsv(0)).byteLength / 1048576).toFixed(1)} MB CSV), ${RUNS} runs, medians`,
);
console.log(
  `import path: ${(oursMs / 1000).toFixed(2)} s  (read + map + check + anonymise ${(median(oursRuns.map((r) => r.prepare)) / 1000).toFixed(2)} s, store ${(median(oursRuns.map((r) => r.store)) / 1000).toFixed(2)} s)`,
);
console.log(`floor (papaparse + COPY into plain tables): ${(floorMs / 1000).toFixed(2)} s`);
console.log(
  `floor (papaparse + COPY into the bank's tables, with their constraints and indexes): ${(bankFloorMs / 1000).toFixed(2)} s`,
);
console.log(`ratio to the plain floor: ${ratio.toFixed(2)}; to the bank-table floor: ${(oursMs / bankFloorMs).toFixed(2)}`);
console.log(`target: within 3× of the floor (plain) — ${ratio <= 3 ? 'met' : 'not met'}`);
await app.db.destroy();
await owner.db.destroy();
await superuser.db.destroy();
