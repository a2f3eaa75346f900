// npm run bench:import — a 100,000-row CSV checked, anonymised and stored through the import path,
// against the floor of papaparse plus PostgreSQL COPY of the same rows. Prints figures; not a test.
import { resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

const projectDir = resolve(import.meta.dirname, '..');
ensureDependencies(projectDir);
const { cleanup } = await import('./lib/children.mjs');
const { runMain } = await import('./lib/errors.mjs');
const { dropDatabase } = await import('./lib/provision.mjs');
const stack = await import('./lib/stack.mjs');

await runMain(async () => {
  const database = 'claybank_bench';
  const { urls } = await stack.bringUpDatabase({ database, fresh: true, quiet: true });
  stack.migrate(urls.ownerUrl);
  stack.runTsx(
    'scripts/bench-import-run.ts',
    {
      BENCH_APP_URL: urls.appUrl,
      BENCH_OWNER_URL: urls.ownerUrl,
      BENCH_SUPER_URL: urls.superUrl.replace(/\/postgres$/, `/${database}`),
    },
    'The import benchmark',
  );
  if (!process.env.BENCH_KEEP) await dropDatabase(urls.superUrl, database);
  else console.log(`kept ${urls.ownerUrl}`);
});
await cleanup();
