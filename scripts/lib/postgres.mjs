// Debian's PostgreSQL in a project-local cluster on 127.0.0.1: find or install the binaries,
// initialise once, start (reusing a running cluster), stop cleanly when the last user leaves.
import { execFileSync, spawnSync } from 'node:child_process';
import {
  chmodSync,
  chownSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  rmSync,
  statfsSync,
  writeFileSync,
} from 'node:fs';
import { dirname, join } from 'node:path';
import { RunbookError } from './errors.mjs';
import { portInUse } from './net.mjs';
import { checkoutId, dataDir, settings } from './settings.mjs';

const MIN_MAJOR = 13;
const MIN_FREE_BYTES = 300 * 1024 * 1024;
const isRoot = process.getuid?.() === 0;

function run(cmd, args, options = {}) {
  return spawnSync(cmd, args, { encoding: 'utf8', ...options });
}

/** Runs a PostgreSQL binary as the user that owns the cluster (postgres when we are root). */
function runAsServerUser(binary, args) {
  return isRoot ? run('runuser', ['-u', 'postgres', '--', binary, ...args]) : run(binary, args);
}

function installedMajors() {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return [];
  return readdirSync(root)
    .map(Number)
    .filter((major) => Number.isInteger(major) && existsSync(join(root, String(major), 'bin', 'pg_ctl')))
    .sort((a, b) => b - a);
}

function aptInstall(pkg) {
  console.log(`  installing Debian's ${pkg} package (apt-get install -y ${pkg}) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  let result = run('apt-get', ['install', '-y', '-q', pkg], { env, stdio: 'inherit' });
  if (result.status !== 0) {
    run('apt-get', ['update', '-q'], { env, stdio: 'inherit' });
    result = run('apt-get', ['install', '-y', '-q', pkg], { env, stdio: 'inherit' });
  }
  if (result.status !== 0) {
    throw new RunbookError(
      `apt-get could not install ${pkg}. Check the network and apt sources, then run: apt-get install -y ${pkg}`,
    );
  }
}

/** Finds pg_ctl, initdb and pg_isready, installing Debian's postgresql package when root. */
export function findBinaries() {
  if (process.env.PG_BIN_DIR) {
    const dir = process.env.PG_BIN_DIR;
    if (!existsSync(join(dir, 'pg_ctl')))
      throw new RunbookError(`PG_BIN_DIR=${dir} has no pg_ctl in it. Point it at PostgreSQL's bin folder or unset it.`);
    return binariesIn(dir);
  }
  let majors = installedMajors();
  if (majors.length === 0) {
    if (!isRoot) {
      throw new RunbookError(
        "PostgreSQL's server programs are not installed (looked in /usr/lib/postgresql/<version>/bin).\n" +
          '  Install them with:  sudo apt-get install -y postgresql\n  then run this command again.',
      );
    }
    aptInstall('postgresql');
    majors = installedMajors();
  }
  const major = majors[0];
  if (major === undefined)
    throw new RunbookError('PostgreSQL was installed but pg_ctl is still missing under /usr/lib/postgresql/<version>/bin.');
  if (major < MIN_MAJOR) {
    throw new RunbookError(
      `PostgreSQL ${major} is too old; Claybank needs ${MIN_MAJOR} or newer (Debian 12 ships 15). Install a newer postgresql package.`,
    );
  }
  return binariesIn(join('/usr/lib/postgresql', String(major), 'bin'));
}

function binariesIn(dir) {
  const version = execFileSync(join(dir, 'pg_ctl'), ['--version'], { encoding: 'utf8' });
  const major = Number(/(\d+)(?:\.\d+)?/.exec(version)?.[1]);
  return { dir, major, pgCtl: join(dir, 'pg_ctl'), initdb: join(dir, 'initdb'), pgIsReady: join(dir, 'pg_isready') };
}

/** True when the postgres user can reach (traverse) every folder down to dir. */
function serverUserCanReach(dir) {
  if (!isRoot) return true;
  return run('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

/**
 * The cluster's folder: `.data/postgres` in the checkout, or, when the checkout sits where the
 * postgres user cannot enter (a clone under /root), a folder under /var/lib/claybank.
 */
export function clusterLocation() {
  if (process.env.PG_DATA_DIR) return { dir: process.env.PG_DATA_DIR, secretsDir: dataDir, relocated: false };
  mkdirSync(dataDir, { recursive: true });
  if (serverUserCanReach(dataDir)) return { dir: join(dataDir, 'postgres', 'data'), secretsDir: dataDir, relocated: false };
  const base = join('/var/lib/claybank', checkoutId);
  return { dir: join(base, 'postgres', 'data'), secretsDir: base, relocated: true };
}

function checkDiskSpace(dir) {
  const probe = existsSync(dir) ? dir : dirname(dir);
  const stats = statfsSync(existsSync(probe) ? probe : '/');
  const freeBytes = stats.bavail * stats.bsize;
  if (freeBytes < MIN_FREE_BYTES) {
    throw new RunbookError(
      `The disk holding ${probe} has only ${(freeBytes / 1048576).toFixed(0)} MB free; the database needs at least ${MIN_FREE_BYTES / 1048576} MB.\n` +
        '  Free some space (df -h shows where) and run this command again.',
    );
  }
}

/** The cluster's base folder (data folder, log, temporary files) belongs to the server user. */
function prepareFolder(dir) {
  mkdirSync(dir, { recursive: true });
  if (isRoot) {
    const { uid, gid } = serverUserIds();
    chownSync(dirname(dir), uid, gid);
    chownSync(dir, uid, gid);
  }
  chmodSync(dir, 0o700);
}

function serverUserIds() {
  const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).trim());
  const gid = Number(execFileSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).trim());
  return { uid, gid };
}

/** Creates the cluster once; checks that an existing one matches the installed major version. */
export function ensureCluster(bins, dir, superPassword) {
  const versionFile = join(dir, 'PG_VERSION');
  if (existsSync(versionFile)) {
    const clusterMajor = Number(readFileSync(versionFile, 'utf8').trim());
    if (clusterMajor !== bins.major) {
      throw new RunbookError(
        `The database folder ${dir} was made by PostgreSQL ${clusterMajor}, but this machine has PostgreSQL ${bins.major}.\n` +
          `  Either install postgresql-${clusterMajor}, or move that folder away to start with an empty database (its data will not be loaded).`,
      );
    }
    return false;
  }
  checkDiskSpace(dir);
  prepareFolder(dir);
  const pwFile = join(dirname(dir), `.pw-${process.pid}`);
  writeFileSync(pwFile, `${superPassword}\n`, { mode: 0o600 });
  if (isRoot) {
    const { uid, gid } = serverUserIds();
    chownSync(pwFile, uid, gid);
  }
  try {
    const result = runAsServerUser(bins.initdb, [
      '-D',
      dir,
      '-U',
      'postgres',
      '--pwfile',
      pwFile,
      '--auth-host=scram-sha-256',
      '--auth-local=scram-sha-256',
      '-E',
      'UTF8',
      '--locale=C.UTF-8',
    ]);
    if (result.status !== 0) {
      const detail = `${result.stderr}${result.stdout}`.trim();
      if (/No space left/i.test(detail))
        throw new RunbookError(`The disk is full: initdb could not write ${dir}. Free some space and try again.`);
      throw new RunbookError(`initdb could not create the database folder ${dir}:\n${detail}`);
    }
  } finally {
    rmSync(pwFile, { force: true });
  }
  return true;
}

function logFile(dir) {
  return join(dirname(dir), 'server.log');
}

function isReady(bins, port = settings.pgPort) {
  return run(bins.pgIsReady, ['-q', '-h', settings.host, '-p', String(port)]).status === 0;
}

function runningPid(dir) {
  const pidFile = join(dir, 'postmaster.pid');
  if (!existsSync(pidFile)) return null;
  const lines = readFileSync(pidFile, 'utf8').split('\n');
  const pid = Number(lines[0]);
  const port = Number(lines[3]);
  try {
    process.kill(pid, 0);
    return { pid, port };
  } catch {
    return null;
  }
}

/**
 * Starts the cluster on 127.0.0.1:PG_PORT. Returns { started } — false when it was already running
 * (another `npm start` or `npm test` of this checkout), so the caller knows whether to stop it.
 */
export async function startCluster(bins, dir, port = settings.pgPort) {
  const running = runningPid(dir);
  if (running && running.port === port && isReady(bins, port)) return { started: false };
  if (running && running.port !== port) {
    throw new RunbookError(
      `This checkout's database is already running on port ${running.port} (pid ${running.pid}), not on PG_PORT=${port}.\n` +
        '  Stop the other run first (Ctrl-C in its terminal), or use the same PG_PORT.',
    );
  }
  if (await portInUse(port)) {
    throw new RunbookError(
      `Port ${port} on 127.0.0.1 is already in use by another program, so the database cannot start there.\n` +
        `  Choose another port, e.g.:  PG_PORT=54339 npm start   (and the same PG_PORT for npm test).`,
    );
  }
  checkDiskSpace(dir);
  const options = `-p ${port} -c listen_addresses=${settings.host} -c unix_socket_directories=''`;
  let lastOutput = '';
  for (let attempt = 0; attempt < 10; attempt++) {
    const result = runAsServerUser(bins.pgCtl, ['-D', dir, '-l', logFile(dir), '-w', '-t', '30', '-o', options, 'start']);
    if (result.status === 0 && isReady(bins, port)) return { started: true };
    lastOutput = `${result.stdout}${result.stderr}`;
    await new Promise((r) => setTimeout(r, 700));
  }
  const log = existsSync(logFile(dir)) ? readFileSync(logFile(dir), 'utf8').split('\n').slice(-15).join('\n') : '';
  if (/No space left/i.test(log + lastOutput)) {
    throw new RunbookError(
      `The database could not start because the disk is full (see ${logFile(dir)}). Free some space and try again.`,
    );
  }
  if (/could not bind|Address already in use/i.test(log + lastOutput)) {
    throw new RunbookError(`Port ${port} is in use; set PG_PORT to a free port and try again.`);
  }
  throw new RunbookError(`The database did not start. Last lines of ${logFile(dir)}:\n${log}\n${lastOutput}`);
}

export function stopCluster(bins, dir, mode = 'fast') {
  if (!runningPid(dir)) return;
  runAsServerUser(bins.pgCtl, ['-D', dir, '-m', mode, '-w', '-t', '30', 'stop']);
}

// Several commands of one checkout (npm start, npm test) may share the cluster. Each registers
// itself; the one that leaves last and started it stops it.
const usersDir = join(dataDir, 'postgres-users');

export function registerUser() {
  mkdirSync(usersDir, { recursive: true });
  writeFileSync(join(usersDir, String(process.pid)), '');
}

/** Unregisters this process; returns how many other live processes still use the cluster. */
export function unregisterUser() {
  rmSync(join(usersDir, String(process.pid)), { force: true });
  if (!existsSync(usersDir)) return 0;
  let others = 0;
  for (const name of readdirSync(usersDir)) {
    try {
      process.kill(Number(name), 0);
      others++;
    } catch {
      rmSync(join(usersDir, name), { force: true });
    }
  }
  return others;
}

const startedMarker = join(dataDir, 'postgres-started-by-claybank');

/** Notes that a Claybank command (not the person, not another tool) started the running cluster. */
export function markStartedByUs() {
  mkdirSync(usersDir, { recursive: true });
  writeFileSync(startedMarker, String(process.pid));
}

/** True (and forgets it) when a Claybank command started the running cluster. */
export function takeStartedByUs() {
  if (!existsSync(startedMarker)) return false;
  rmSync(startedMarker, { force: true });
  return true;
}
