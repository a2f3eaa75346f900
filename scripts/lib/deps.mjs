// Installs the locked dependencies when they are missing or older than package-lock.json.
// Uses only Node's own modules: it runs before anything is installed.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';

export function ensureDependencies(projectDir) {
  const marker = join(projectDir, 'node_modules', '.package-lock.json');
  const lock = join(projectDir, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('• Installing dependencies (npm ci) …');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: projectDir, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('\n✖ npm ci failed (see above). Check the network access to the npm registry and try again.\n');
    process.exit(1);
  }
}
