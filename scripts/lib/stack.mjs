// The local stack shared by `npm start`, `npm run dev` and `npm test`: database, migrations,
// demo data, mail fake, the built app.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { onCleanup, startChild } from './children.mjs';
import { RunbookError } from './errors.mjs';
import { portInUse, waitForPort } from './net.mjs';
import {
  clusterLocation,
  ensureCluster,
  findBinaries,
  markStartedByUs,
  registerUser,
  startCluster,
  stopCluster,
  takeStartedByUs,
  unregisterUser,
} from './postgres.mjs';
import { ensureDatabase, ensureRoles } from './provision.mjs';
import { databaseUrls, dataDir, localSecrets, projectDir, settings } from './settings.mjs';

const bin = (name) => join(projectDir, 'node_modules', '.bin', name);

/** Starts (or reuses) the cluster, makes the roles and the database; stops the cluster on cleanup when we started it. */
export async function bringUpDatabase({ database, fresh = false, quiet = false }) {
  const bins = findBinaries();
  const { dir, secretsDir, relocated } = clusterLocation();
  const secrets = localSecrets(secretsDir);
  const created = ensureCluster(bins, dir, secrets.pgSuperPassword);
  if (!quiet || relocated) {
    const where = relocated ? `${dir} (outside the checkout: the postgres user cannot enter ${projectDir})` : dir;
    console.log(`• PostgreSQL ${bins.major}: ${created ? 'created cluster in' : 'cluster in'} ${where}`);
  }
  registerUser();
  const { started } = await startCluster(bins, dir);
  if (started) markStartedByUs();
  onCleanup(() => {
    const others = unregisterUser();
    // The last Claybank command out stops the cluster if one of them started it.
    if (others === 0 && takeStartedByUs()) {
      stopCluster(bins, dir);
      console.log('• PostgreSQL stopped.');
    } else if (started) {
      console.log(
        `• PostgreSQL left running: ${others} other Claybank command(s) of this checkout still use it; the last one stops it.`,
      );
    }
  });
  if (!quiet) console.log(`• PostgreSQL ${started ? 'started' : 'already running'} on 127.0.0.1:${settings.pgPort}`);
  const urls = databaseUrls(secrets, database);
  await ensureRoles(urls.superUrl, secrets);
  const createdDb = await ensureDatabase(urls.superUrl, database, { fresh });
  if (!quiet && createdDb) console.log(`• Database ${database} created`);
  return { urls, secrets };
}

/** Runs a TypeScript script with tsx and fails loudly when it fails. */
/**
 * Node's young generation is small by default; uploads of 100,000 rows allocate a great deal of
 * short-lived garbage, and a larger semi-space cuts the collector's share (measured by bench:import).
 */
export const NODE_SERVER_FLAGS = ['--max-semi-space-size=64'];

export function runTsx(script, env, what) {
  const result = spawnSync(bin('tsx'), [script], {
    cwd: projectDir,
    env: { ...process.env, NODE_OPTIONS: [process.env.NODE_OPTIONS ?? '', ...NODE_SERVER_FLAGS].join(' ').trim(), ...env },
    stdio: 'inherit',
  });
  if (result.status !== 0) throw new RunbookError(`${what} failed (see the lines above).`);
}

export function migrate(ownerUrl) {
  runTsx('scripts/migrate.ts', { DATABASE_OWNER_URL: ownerUrl }, 'Database migration');
}

/** Loads the invented demo scenario through the app's own services, as the app role. */
export function seed({ appUrl, secrets, port, signInsFile }) {
  runTsx(
    'scripts/seed.ts',
    {
      DATABASE_URL: appUrl,
      BETTER_AUTH_SECRET: secrets.authSecret,
      APP_URL: `http://127.0.0.1:${port}`,
      CLAYBANK_DEMO_SIGN_INS_FILE: signInsFile,
    },
    'Loading the demo scenario',
  );
}

export async function assertPortFree(port, variable, what) {
  if (await portInUse(port)) {
    throw new RunbookError(
      `Port ${port} on 127.0.0.1 is already in use, so the ${what} cannot start there.\n` +
        `  If Claybank is already running, use that one; otherwise choose another port, e.g. ${variable}=${port + 10} npm start`,
    );
  }
}

/** Starts the SMTP fake; returns its SMTP and inbox URLs. */
export async function startMailFake({ smtpPort, httpPort, storeDir, variablePrefix = 'MAIL_FAKE' }) {
  await assertPortFree(smtpPort, `${variablePrefix}_SMTP_PORT`, 'mail fake (SMTP)');
  await assertPortFree(httpPort, `${variablePrefix}_HTTP_PORT`, 'mail fake (inbox)');
  mkdirSync(storeDir, { recursive: true });
  startChild(
    'mail',
    bin('tsx'),
    ['fakes/mail/server.ts', '--smtp-port', String(smtpPort), '--http-port', String(httpPort), '--dir', storeDir],
    {
      cwd: projectDir,
    },
  );
  await waitForPort(httpPort, 15_000, 'The mail fake');
  return { smtpUrl: `smtp://127.0.0.1:${smtpPort}`, inboxUrl: `http://127.0.0.1:${httpPort}` };
}

/** Starts the search fake (data kept under `storeDir`); returns the URL and key the app uses. */
export async function startSearchFake({ port, storeDir, key, variable = 'SEARCH_FAKE_PORT' }) {
  await assertPortFree(port, variable, 'search fake');
  mkdirSync(storeDir, { recursive: true });
  startChild('search', bin('tsx'), ['fakes/search/server.ts', '--port', String(port), '--dir', storeDir], {
    cwd: projectDir,
    env: {
      ...process.env,
      SEARCH_FAKE_KEY: key,
      NODE_OPTIONS: [process.env.NODE_OPTIONS ?? '', ...NODE_SERVER_FLAGS].join(' ').trim(),
    },
  });
  await waitForPort(port, 30_000, 'The search fake');
  return { url: `http://127.0.0.1:${port}`, key };
}

function listFiles(dir) {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    return entry.isDirectory() ? listFiles(path) : [path];
  });
}

/** A fingerprint of everything the build reads, so an unchanged checkout is not rebuilt. */
function sourceFingerprint() {
  const files = [
    ...listFiles(join(projectDir, 'src')),
    ...listFiles(join(projectDir, 'public')),
    join(projectDir, 'astro.config.mjs'),
    join(projectDir, 'package-lock.json'),
    join(projectDir, 'tsconfig.json'),
  ].sort();
  const hash = createHash('sha256');
  for (const file of files) {
    const stats = statSync(file);
    hash.update(`${relative(projectDir, file)}:${stats.size}:${stats.mtimeMs}\n`);
  }
  return hash.digest('hex');
}

/** Builds the app into outDir unless the sources are unchanged since the last build there. */
export function buildApp(outDir, { force = false } = {}) {
  const stampFile = join(outDir, '.source-fingerprint');
  const fingerprint = sourceFingerprint();
  if (
    !force &&
    existsSync(join(outDir, 'server', 'entry.mjs')) &&
    existsSync(stampFile) &&
    readFileSync(stampFile, 'utf8') === fingerprint
  ) {
    console.log('• App build is up to date');
    return;
  }
  console.log('• Building the app (astro build) …');
  const started = Date.now();
  const result = spawnSync(bin('astro'), ['build'], {
    cwd: projectDir,
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', CLAYBANK_BUILD_DIR: outDir },
    encoding: 'utf8',
  });
  if (result.status !== 0) {
    process.stdout.write(result.stdout);
    process.stderr.write(result.stderr);
    throw new RunbookError('The app did not build (see the errors above).');
  }
  writeFileSync(stampFile, fingerprint);
  console.log(`• Built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

/**
 * A build for a test run, in a folder named after the sources' fingerprint: a run never rebuilds a
 * folder another run may be serving from, and an unchanged checkout reuses the last build. The build is
 * made in a temporary folder and renamed into place. Returns the folder.
 */
export function buildForTests(buildsDir) {
  const fingerprint = sourceFingerprint();
  const outDir = join(buildsDir, fingerprint.slice(0, 16));
  if (existsSync(join(outDir, 'server', 'entry.mjs'))) {
    console.log('• App build is up to date');
    return outDir;
  }
  const tmpDir = `${outDir}.tmp-${process.pid}`;
  buildApp(tmpDir, { force: true });
  try {
    renameSync(tmpDir, outDir);
  } catch {
    rmSync(tmpDir, { recursive: true, force: true });
  }
  const builds = readdirSync(buildsDir)
    .filter((name) => !name.includes('.tmp-'))
    .map((name) => ({ name, time: statSync(join(buildsDir, name)).mtimeMs }))
    .sort((a, b) => b.time - a.time);
  for (const old of builds.slice(3)) rmSync(join(buildsDir, old.name), { recursive: true, force: true });
  return outDir;
}

/** The environment the app server reads through astro:env. */
export function appEnvironment({ port, appUrl, secrets, mail, search, mode = 'development' }) {
  return {
    ...(search ? { MEILISEARCH_URL: search.url, MEILISEARCH_KEY: search.key } : {}),
    HOST: settings.host,
    PORT: String(port),
    APP_URL: `http://127.0.0.1:${port}`,
    APP_MODE: mode,
    DATABASE_URL: appUrl,
    BETTER_AUTH_SECRET: secrets.authSecret,
    RECORD_KEY_SECRET: secrets.recordKeySecret,
    SMTP_URL: mail.smtpUrl,
    MAIL_INBOX_URL: mail.inboxUrl,
    ASTRO_TELEMETRY_DISABLED: '1',
  };
}

/** Serves the built app (node adapter's standalone handler, through scripts/serve.mjs) with NODE_ENV=production. */
export async function serveBuiltApp(outDir, env, { quiet = false } = {}) {
  await assertPortFree(Number(env.PORT), 'PORT', 'app');
  const child = startChild('app', process.execPath, [...NODE_SERVER_FLAGS, join(projectDir, 'scripts', 'serve.mjs')], {
    cwd: projectDir,
    env: { ...process.env, ...env, NODE_ENV: 'production', CLAYBANK_BUILD_DIR: outDir },
    quiet,
  });
  await waitForPort(Number(env.PORT), 30_000, 'The app server');
  return child;
}

/** Runs `astro dev` on the same port and environment. */
export async function serveDevApp(env) {
  await assertPortFree(Number(env.PORT), 'PORT', 'app');
  const child = startChild('dev', bin('astro'), ['dev', '--host', settings.host, '--port', env.PORT], {
    cwd: projectDir,
    env: { ...process.env, ...env },
  });
  await waitForPort(Number(env.PORT), 60_000, 'astro dev');
  return child;
}

export { dataDir };
