// npm test: sets up everything on a fresh machine and runs every suite — lint, types, unit,
// database, API and browser — against a fresh test database and the built app. Ends with one
// line `N passed, N failed, N skipped` and exits non-zero when anything failed or a selected suite
// ran no tests.
//   npm test -- --only unit,db      run some suites (lint, types, unit, db, api, browser)
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

const projectDir = resolve(import.meta.dirname, '..');
ensureDependencies(projectDir);

const { cleanup, onCleanup } = await import('./lib/children.mjs');
const { RunbookError } = await import('./lib/errors.mjs');
const { freePort } = await import('./lib/net.mjs');
const { dropDatabase, dropStaleTestDatabases } = await import('./lib/provision.mjs');
const { dataDir, databaseUrls } = await import('./lib/settings.mjs');
const stack = await import('./lib/stack.mjs');

const SUITES = ['lint', 'types', 'unit', 'db', 'api', 'browser'];
const onlyArg = process.argv.find((arg) => arg.startsWith('--only'));
const onlyValue = onlyArg?.includes('=')
  ? onlyArg.split('=')[1]
  : onlyArg
    ? process.argv[process.argv.indexOf(onlyArg) + 1]
    : undefined;
const selected = new Set(onlyValue ? onlyValue.split(',') : SUITES);
for (const name of selected) {
  if (!SUITES.includes(name)) {
    console.error(`Unknown suite "${name}". Suites: ${SUITES.join(', ')}`);
    process.exit(2);
  }
}

const runDir = join(dataDir, 'test-runs', String(process.pid));
const tally = [];
const bin = (name) => join(projectDir, 'node_modules', '.bin', name);

function record(suite, passed, failed, skipped = 0, note = '') {
  tally.push({ suite, passed, failed, skipped, note });
  const counts = `${passed} passed, ${failed} failed, ${skipped} skipped`;
  console.log(`  ${failed ? '✖' : '✔'} ${suite}: ${counts}${note ? ` (${note})` : ''}`);
}

function totals() {
  const sum = (key) => tally.reduce((total, row) => total + row[key], 0);
  return { passed: sum('passed'), failed: sum('failed'), skipped: sum('skipped') };
}

/** A whole-tool check (lint, types) counts as one test. */
function runCheck(suite, command, args, env = {}) {
  console.log(`\n• ${suite}: ${[command.split('/').pop(), ...args].join(' ')}`);
  const started = Date.now();
  const result = spawnSync(command, args, { cwd: projectDir, env: { ...process.env, ...env }, encoding: 'utf8' });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  if (result.status === 0) {
    record(suite, 1, 0, 0, `${seconds} s`);
  } else {
    process.stdout.write(result.stdout.split('\n').slice(-80).join('\n'));
    process.stderr.write(result.stderr.split('\n').slice(-80).join('\n'));
    record(suite, 0, 1, 0, `${seconds} s`);
  }
}

/**
 * Runs vitest projects; counts every test from its JSON report. A file that fails to load counts as
 * one failure, and so does a selected project in which no test ran (none found, or all skipped).
 */
function runVitest(projects, env) {
  const report = join(runDir, `vitest-${projects.join('-')}.json`);
  const args = [
    'run',
    '--config',
    'tests/vitest.config.ts',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
  ];
  for (const project of projects) args.push('--project', project);
  console.log(`\n• ${projects.join(' + ')}: vitest`);
  const result = spawnSync(bin('vitest'), args, { cwd: projectDir, env: { ...process.env, ...env }, stdio: 'inherit' });
  if (!existsSync(report)) {
    record(projects.join('+'), 0, 1, 0, `vitest exited with ${result.status} and wrote no report (no test files found?)`);
    return;
  }
  const json = JSON.parse(readFileSync(report, 'utf8'));
  let projectFailures = 0;
  for (const project of projects) {
    let files = 0;
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const file of json.testResults) {
      const inProject = file.name.includes(`/tests/${project}/`);
      if (!inProject) continue;
      files += 1;
      const assertions = file.assertionResults ?? [];
      passed += assertions.filter((a) => a.status === 'passed').length;
      const failedHere = assertions.filter((a) => a.status === 'failed').length;
      failed += failedHere;
      // skipped, todo, and pending (never started): every test that neither passed nor failed
      skipped += assertions.length - failedHere - assertions.filter((a) => a.status === 'passed').length;
      if (file.status === 'failed' && failedHere === 0) failed += 1;
    }
    let note = '';
    if (passed + failed === 0) {
      failed += 1;
      note = files === 0 ? `no test files found under tests/${project}` : `no test ran in ${files} file(s)`;
    }
    projectFailures += failed;
    record(project, passed, failed, skipped, note);
  }
  if (result.status !== 0 && projectFailures === 0) {
    record('vitest', 0, 1, 0, `exited with ${result.status}`);
  }
}

function ensureChromium() {
  if (existsSync('/usr/bin/chromium')) return;
  if (process.getuid?.() !== 0) {
    throw new RunbookError("Browser tests need Debian's Chromium. Install it with:  sudo apt-get install -y chromium");
  }
  console.log("• Installing Debian's chromium package for the browser tests …");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  let result = spawnSync('apt-get', ['install', '-y', '-q', 'chromium'], { env, stdio: 'inherit' });
  if (result.status !== 0) {
    spawnSync('apt-get', ['update', '-q'], { env, stdio: 'inherit' });
    result = spawnSync('apt-get', ['install', '-y', '-q', 'chromium'], { env, stdio: 'inherit' });
  }
  if (result.status !== 0) throw new RunbookError('apt-get could not install chromium; run: apt-get install -y chromium');
}

async function main() {
  mkdirSync(runDir, { recursive: true });
  onCleanup(() => rmSync(runDir, { recursive: true, force: true }));
  const started = Date.now();

  // Set-up first (it may install Debian packages), then the suites.
  const needsStack = ['db', 'api', 'browser'].some((suite) => selected.has(suite));
  const env = { CLAYBANK_TEST_ARTIFACTS: join(dataDir, 'test-artifacts') };
  let stackUrls = null;
  let secrets = null;
  let mail = null;
  let search = null;
  if (needsStack) {
    const database = `claybank_test_${process.pid}`;
    console.log(`\n• Test database ${database}`);
    const up = await stack.bringUpDatabase({ database, fresh: true, quiet: true });
    const urls = up.urls;
    secrets = up.secrets;
    stackUrls = urls;
    await dropStaleTestDatabases(databaseUrls(secrets, 'postgres').superUrl);
    onCleanup(() => dropDatabase(urls.superUrl, database));
    stack.migrate(urls.ownerUrl);
    stack.seed({ appUrl: urls.appUrl, secrets, port: 4321, signInsFile: join(runDir, 'demo-sign-ins.json') });
    mail = await stack.startMailFake({ smtpPort: await freePort(), httpPort: await freePort(), storeDir: join(runDir, 'mail') });
    search = await stack.startSearchFake({ port: await freePort(), storeDir: join(runDir, 'search'), key: secrets.searchKey });
    Object.assign(env, {
      CLAYBANK_TEST_SEARCH_URL: search.url,
      CLAYBANK_TEST_SEARCH_KEY: search.key,
      CLAYBANK_TEST_DATABASE_URL: urls.appUrl,
      CLAYBANK_TEST_OWNER_URL: urls.ownerUrl,
      CLAYBANK_TEST_SUPER_URL: urls.superUrl.replace(/\/postgres$/, `/${database}`),
      CLAYBANK_TEST_SMTP_URL: mail.smtpUrl,
      CLAYBANK_TEST_INBOX_URL: mail.inboxUrl,
      CLAYBANK_TEST_DEMO_SIGN_INS: join(runDir, 'demo-sign-ins.json'),
    });
  }
  if (selected.has('browser')) ensureChromium();

  if (selected.has('lint')) runCheck('lint', bin('biome'), ['ci', '--colors=off', '.']);
  if (selected.has('types')) runCheck('types', bin('astro'), ['check'], { ASTRO_TELEMETRY_DISABLED: '1' });

  const vitestFirst = ['unit', 'db'].filter((p) => selected.has(p) && (p === 'unit' || needsStack));
  if (vitestFirst.length) runVitest(vitestFirst, env);

  if (needsStack && (selected.has('api') || selected.has('browser'))) {
    let outDir;
    try {
      outDir = stack.buildForTests(join(dataDir, 'test-builds'));
    } catch (error) {
      record('build', 0, 1, 0, error.message);
      return finish(started);
    }
    const port = await freePort();
    const appEnv = stack.appEnvironment({ port, appUrl: stackUrls.appUrl, secrets, mail, search });
    await stack.serveBuiltApp(outDir, appEnv, { quiet: true });
    Object.assign(env, {
      CLAYBANK_TEST_BASE_URL: appEnv.APP_URL,
      CLAYBANK_TEST_BUILD_DIR: outDir,
      CLAYBANK_TEST_AUTH_SECRET: secrets.authSecret,
    });
    // One after the other: both sign in from 127.0.0.1 and share its sign-in allowance.
    if (selected.has('api')) runVitest(['api'], env);
    if (selected.has('browser')) runVitest(['browser'], env);
  }
  return finish(started);
}

function finish(started) {
  const suites = tally.map(
    (row) => `${row.suite} ${row.passed}/${row.passed + row.failed}${row.skipped ? ` (${row.skipped} skipped)` : ''}`,
  );
  console.log(`\nSuites: ${suites.join(', ')}`);
  console.log(`Time: ${((Date.now() - started) / 1000).toFixed(0)} s`);
  return totals();
}

let outcome = { passed: 0, failed: 1, skipped: 0 };
try {
  outcome = await main();
} catch (error) {
  console.error(error instanceof RunbookError ? `\n✖ ${error.message}` : error);
  const sums = totals();
  outcome = { ...sums, failed: sums.failed + 1 };
}
await cleanup();
console.log(`${outcome.passed} passed, ${outcome.failed} failed, ${outcome.skipped} skipped`);
process.exit(outcome.failed > 0 || outcome.passed === 0 ? 1 : 0);
