// npm run bench:stats — statistics of a 100,000-record selection (every parameter and six correlations)
// through the statistics service, against PostgreSQL merely streaming the same columns, and the cached
// repeat. Generates the records into a scratch database. Prints figures; not a test.
import { resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

const projectDir = resolve(import.meta.dirname, '..');
ensureDependencies(projectDir);
const { cleanup } = await import('./lib/children.mjs');
const { runMain } = await import('./lib/errors.mjs');
const { dropDatabase } = await import('./lib/provision.mjs');
const stack = await import('./lib/stack.mjs');

await runMain(async () => {
  const database = 'claybank_bench_stats';
  const { urls, secrets } = await stack.bringUpDatabase({ database, fresh: true, quiet: true });
  stack.migrate(urls.ownerUrl);
  stack.runTsx(
    'scripts/bench-stats-run.ts',
    {
      BENCH_APP_URL: urls.appUrl,
      BENCH_SUPER_URL: urls.superUrl.replace(/\/postgres$/, `/${database}`),
      BENCH_RECORD_KEY_SECRET: secrets.recordKeySecret,
    },
    'The statistics benchmark',
  );
  if (!process.env.BENCH_KEEP) await dropDatabase(urls.superUrl, database);
  else console.log(`kept ${urls.appUrl}`);
});
await cleanup();
