// The measuring half of `npm run bench:stats` (scripts/bench-stats.mjs sets up the database).
import { fileURLToPath } from 'node:url';
import { sql } from 'kysely';
import type { ResolvedIdentity } from '../src/lib/server/auth/resolve-actor';
import { connectDatabase } from '../src/lib/server/db/connect';
import { ColumnsBuilder } from '../src/lib/server/statistics/columns-builder';
import { createStatisticsRuntime } from '../src/lib/server/statistics/statistics-pool';
import { streamSelectionRows } from '../src/lib/server/statistics/statistics-repository';
import { selectionOverview } from '../src/lib/server/statistics/statistics-service';
import { inTenantTransaction } from '../src/lib/server/tenancy/tenant-transaction';

const RECORDS = Number(process.env.BENCH_RECORDS ?? 100_000);
const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const app = connectDatabase(process.env.BENCH_APP_URL ?? '', { max: 2 });
const superuser = connectDatabase(process.env.BENCH_SUPER_URL ?? '', { max: 1 });
const FIRMS = ['bench-firm-a', 'bench-firm-b', 'bench-firm-c'];

/** Invented records with the relations the statistics look for (Cc with LL, wn and e0; σ'p with depth). */
async function generate(): Promise<void> {
  const db = superuser.db;
  for (const id of FIRMS) {
    await db
      .insertInto('organization')
      .values({ id, name: `${id} (invented)`, slug: id, logo: null, metadata: null, createdAt: new Date() })
      .execute();
  }
  const region = await db
    .insertInto('region')
    .values({ name: 'Bench Region (invented)', slug: 'bench-region', created_at: new Date(), updated_at: new Date() })
    .returning('id')
    .executeTakeFirstOrThrow();
  const unit = await db
    .insertInto('geological_unit')
    .values({
      name: 'Bench Clay (invented)',
      slug: 'bench-clay',
      genesis: 'estuarine',
      created_at: new Date(),
      updated_at: new Date(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  const version = await db
    .insertInto('bank_version')
    .values({ published_at: new Date(), note: 'bench', record_count: RECORDS })
    .returning('id')
    .executeTakeFirstOrThrow();
  for (const firm of FIRMS) {
    await db
      .insertInto('submission')
      .values({ firm_id: firm, source_kind: 'seed', status: 'accepted', created_at: new Date(), updated_at: new Date() })
      .execute();
  }
  await sql`
    with s as (select id, firm_id from submission)
    insert into test_record (submission_id, firm_id, status, bank_version_id, region_id, geological_unit_id, depth_top_m, depth_bottom_m,
      uscs_symbol, water_content_pct, liquid_limit_pct, plastic_limit_pct, plasticity_index_pct, bulk_unit_weight_kn_per_m3,
      initial_void_ratio, compression_index, recompression_index, preconsolidation_stress_kpa, vertical_effective_stress_kpa,
      overconsolidation_ratio, cv_nc_m2_per_year, cv_oc_m2_per_year, secondary_compression_index, delta_e_over_e0, sample_quality_class, test_method)
    select sub.id, sub.firm_id, 'published', ${version.id}, ${region.id}, ${unit.id}, d, d + 0.45,
      'CH', wn, ll, ll * (1 - pf), ll * pf, 15 + random(), e0, cc, cc * (0.08 + 0.07 * random()), sp, sv, sp / sv,
      exp(ln(1.0) - 0.012 * (ll - 72) + 0.45 * (random() - 0.5)), 6 * exp(0.5 * (random() - 0.5)),
      cc * (0.035 + 0.015 * random()), 0.02 + 0.1 * random(), 1 + floor(random() * 4)::int, 'incremental'
    from (
      select g, 1 + random() * 24 as d, 55 + random() * 50 as wn, 50 + random() * 50 as ll, 0.35 + 0.25 * random() as pf
      from generate_series(1, ${RECORDS}) g
    ) base
    cross join lateral (select 0.01 * (base.wn * 1.1 + 10 * random()) - 0.1 as cc, 1.4 + 0.015 * (base.wn - 55) + 0.3 * random() as e0,
      7 * base.d as sv, 7 * base.d * (1.1 + 0.4 * random()) + 10 as sp) v
    join s sub on sub.firm_id = (array['bench-firm-a', 'bench-firm-b', 'bench-firm-c'])[1 + base.g % 3]
  `.execute(db);
  await sql`analyze test_record`.execute(db);
}

const viewer: ResolvedIdentity = {
  user: { id: 'bench-user', name: 'Bench', email: 'bench@example.test' },
  actor: { userId: 'bench-user', platformRole: 'user', firmId: 'bench-firm-b', firmRole: 'engineer' },
  memberships: [],
  activeFirm: null,
} as unknown as ResolvedIdentity;

/** PostgreSQL streaming the same columns of the same rows to the app, and nothing else. */
async function streamOnly(): Promise<number> {
  return inTenantTransaction(app.db, { firmId: 'bench-firm-b', platformRole: 'user' }, async (trx) => {
    let rows = 0;
    const stream = trx
      .selectFrom('test_record as r')
      .innerJoin('geological_unit as u', 'u.id', 'r.geological_unit_id')
      .select([
        'r.id',
        'r.firm_id',
        'r.depth_top_m',
        'r.depth_bottom_m',
        'r.sample_quality_class',
        'r.uscs_symbol',
        'r.water_content_pct',
        'r.liquid_limit_pct',
        'r.plastic_limit_pct',
        'r.plasticity_index_pct',
        'r.specific_gravity',
        'r.bulk_unit_weight_kn_per_m3',
        'r.initial_void_ratio',
        'r.organic_content_pct',
        'r.compression_index',
        'r.recompression_index',
        'r.preconsolidation_stress_kpa',
        'r.vertical_effective_stress_kpa',
        'r.overconsolidation_ratio',
        'r.cv_nc_m2_per_year',
        'r.cv_oc_m2_per_year',
        'r.secondary_compression_index',
        'r.mv_m2_per_mn',
        'r.permeability_m_per_s',
        'r.delta_e_over_e0',
      ])
      .where('u.slug', '=', 'bench-clay')
      .where('r.status', '=', 'published')
      .stream(4000);
    for await (const _row of stream) rows++;
    return rows;
  });
}

/** The service's own query (masking keys, NC/OC split) streamed into the core's columns, without the worker. */
async function streamIntoColumns(secret: string): Promise<number> {
  return inTenantTransaction(app.db, { firmId: 'bench-firm-b', platformRole: 'user' }, async (trx) => {
    const builder = new ColumnsBuilder();
    for await (const row of streamSelectionRows(trx, { unit: ['bench-clay'] }, 'bench-firm-b', secret)) builder.push(row);
    return builder.finish().length;
  });
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] as number;
const ms = (value: number) => `${value.toFixed(1)} ms`;

async function main() {
  console.log(`Generating ${RECORDS.toLocaleString('en-GB')} invented records …`);
  await generate();
  const runtime = createStatisticsRuntime({
    workerFile: fileURLToPath(new URL('../src/lib/server/statistics/statistics-task-dev.mjs', import.meta.url)),
    recordKeySecret: process.env.BENCH_RECORD_KEY_SECRET ?? '',
  });
  const selection = { unit: ['bench-clay'] };
  // warm-up: JIT, worker start, PostgreSQL caches
  await streamOnly();
  await selectionOverview(app, runtime, viewer, { ...selection, q: 'bench' }, {});
  const streaming: number[] = [];
  const statistics: number[] = [];
  const cached: number[] = [];
  const ownQuery: number[] = [];
  let rows = 0;
  for (let run = 0; run < RUNS; run++) {
    let t = performance.now();
    rows = await streamOnly();
    streaming.push(performance.now() - t);
    t = performance.now();
    await streamIntoColumns(process.env.BENCH_RECORD_KEY_SECRET ?? '');
    ownQuery.push(performance.now() - t);
    t = performance.now();
    const weighting = run % 2 === 0 ? 'equal' : 'byClass';
    const fresh = { ...selection, depth: { min: 0, max: 100 + run } };
    const text = await selectionOverview(app, runtime, viewer, fresh, { weighting });
    statistics.push(performance.now() - t);
    t = performance.now();
    const again = await selectionOverview(app, runtime, viewer, fresh, { weighting });
    cached.push(performance.now() - t);
    if (again !== text) throw new Error('The cached repeat differs from the first answer.');
    if (run === 0) {
      const answer = JSON.parse(text) as { basis: { tests: number }; summaries: unknown[]; correlations: unknown[] };
      console.log(
        `Selection: ${answer.basis.tests} records; ${answer.summaries.length} parameters, ${answer.correlations.length} correlations`,
      );
    }
  }
  const ratio = median(statistics) / median(streaming);
  console.log(
    `PostgreSQL streaming the same ${rows.toLocaleString('en-GB')} rows (${25} columns): median ${ms(median(streaming))}  [${streaming.map(ms).join(', ')}]`,
  );
  console.log(
    `Statistics (stream + masking keys + every parameter + six correlations, worker thread): median ${ms(median(statistics))}  [${statistics.map(ms).join(', ')}]`,
  );
  console.log(
    `  of which the service's query (masking keys, NC/OC split) into columns, no worker: median ${ms(median(ownQuery))}`,
  );
  console.log(`Ratio: ${ratio.toFixed(2)}× (target ≤ 1.5×)`);
  console.log(`Cached repeat: median ${ms(median(cached))}  [${cached.map(ms).join(', ')}] (target ≤ 20 ms)`);
  await runtime.close();
  await app.db.destroy();
  await superuser.db.destroy();
}

await main();
