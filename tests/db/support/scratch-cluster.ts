import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from '../../../scripts/lib/net.mjs';
import { ensureCluster, findBinaries, startCluster, stopCluster } from '../../../scripts/lib/postgres.mjs';
import { ensureDatabase, ensureRoles } from '../../../scripts/lib/provision.mjs';

const root = join(import.meta.dirname, '../../..');

/**
 * A throwaway PostgreSQL cluster of its own (Debian's binaries, a temporary folder, a free port), so
 * a test may stop or crash the database without touching the one other tests use.
 */
export async function scratchCluster() {
  const bins = findBinaries();
  const base = mkdtempSync(join(tmpdir(), 'claybank-scratch-'));
  const dir = join(base, 'data');
  const port = await freePort();
  const secrets = {
    pgSuperPassword: randomBytes(12).toString('hex'),
    pgOwnerPassword: randomBytes(12).toString('hex'),
    pgAppPassword: randomBytes(12).toString('hex'),
  };
  ensureCluster(bins, dir, secrets.pgSuperPassword);
  await startCluster(bins, dir, port);
  const host = `127.0.0.1:${port}`;
  const superUrl = `postgres://postgres:${secrets.pgSuperPassword}@${host}/postgres`;
  await ensureRoles(superUrl, secrets);
  await ensureDatabase(superUrl, 'claybank');
  const urls = {
    superUrl: `postgres://postgres:${secrets.pgSuperPassword}@${host}/claybank`,
    ownerUrl: `postgres://claybank_owner:${secrets.pgOwnerPassword}@${host}/claybank`,
    appUrl: `postgres://claybank_app:${secrets.pgAppPassword}@${host}/claybank`,
  };
  const migrated = spawnSync(join(root, 'node_modules/.bin/tsx'), ['scripts/migrate.ts'], {
    cwd: root,
    env: { ...process.env, DATABASE_OWNER_URL: urls.ownerUrl },
    encoding: 'utf8',
  });
  if (migrated.status !== 0) throw new Error(`migration of the scratch cluster failed: ${migrated.stderr}`);
  return {
    urls,
    port,
    /** stops the server the hard way: no clean shutdown, like a crash or a pulled plug */
    crash: () => stopCluster(bins, dir, 'immediate'),
    restart: () => startCluster(bins, dir, port),
    destroy: () => {
      stopCluster(bins, dir, 'immediate');
      if (!process.env.KEEP_SCRATCH) rmSync(base, { recursive: true, force: true });
      else console.log(`scratch cluster kept in ${base}`);
    },
  };
}
