// npm run bench:preview — does a Monte Carlo preview stall everyone else? Serves the built app
// against a fresh bench database with the demo people, then (scripts/bench-preview-run.mjs) measures
// /api/health alone, the README's preview example at 1 client beside the engine's own time, and
// /api/health again while 4 clients post previews. Prints figures; not a test.
import { mkdirSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

const projectDir = resolve(import.meta.dirname, '..');
ensureDependencies(projectDir);
const { cleanup, onCleanup } = await import('./lib/children.mjs');
const { runMain } = await import('./lib/errors.mjs');
const { freePort } = await import('./lib/net.mjs');
const { dropDatabase } = await import('./lib/provision.mjs');
const { dataDir } = await import('./lib/settings.mjs');
const stack = await import('./lib/stack.mjs');

await runMain(async () => {
  const database = 'claybank_bench_preview';
  const runDir = join(dataDir, 'bench-preview');
  rmSync(runDir, { recursive: true, force: true });
  mkdirSync(runDir, { recursive: true });
  const signInsFile = join(runDir, 'demo-sign-ins.json');
  const { urls, secrets } = await stack.bringUpDatabase({ database, fresh: true, quiet: true });
  // after the app has stopped, so no request still in flight meets a missing database
  if (!process.env.BENCH_KEEP) onCleanup(() => dropDatabase(urls.superUrl, database));
  stack.migrate(urls.ownerUrl);
  const port = await freePort();
  stack.seed({ appUrl: urls.appUrl, secrets, port, signInsFile });
  const mail = await stack.startMailFake({
    smtpPort: await freePort(),
    httpPort: await freePort(),
    storeDir: join(runDir, 'mail'),
  });
  const outDir = stack.buildForTests(join(dataDir, 'test-builds'));
  const env = stack.appEnvironment({ port, appUrl: urls.appUrl, secrets, mail });
  await stack.serveBuiltApp(outDir, env, { quiet: true });
  stack.runTsx(
    'scripts/bench-preview-run.mjs',
    { BENCH_BASE_URL: env.APP_URL, BENCH_SIGN_INS: signInsFile },
    'The preview benchmark',
  );
});
await cleanup();
