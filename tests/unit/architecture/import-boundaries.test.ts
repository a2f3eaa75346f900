import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');
const biome = join(root, 'node_modules/.bin/biome');
const sandbox = mkdtempSync(join(tmpdir(), 'claybank-lint-'));
copyFileSync(join(root, 'biome.json'), join(sandbox, 'biome.json'));
afterAll(() => rmSync(sandbox, { recursive: true, force: true }));

/** Lints a made-up file placed at `path` under the project's biome.json; returns the restricted-import findings. */
function restrictedImports(path: string, source: string): number {
  const file = join(sandbox, path);
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, source);
  const result = spawnSync(biome, ['lint', '--vcs-enabled=false', '--max-diagnostics=50', path], {
    cwd: sandbox,
    encoding: 'utf8',
  });
  rmSync(file);
  return (result.stdout + result.stderr).split('lint/style/noRestrictedImports').length - 1;
}

describe('the lint rules keep the layers apart', () => {
  it.each([
    ['src/lib/consolidation/probe.ts', "import { Kysely } from 'kysely';\nexport const a = Kysely;\n"],
    ['src/lib/consolidation/probe.ts', "import { readFileSync } from 'node:fs';\nexport const a = readFileSync;\n"],
    ['src/lib/consolidation/probe.ts', "import { useState } from 'react';\nexport const a = useState;\n"],
    ['src/lib/consolidation/probe.ts', "import { config } from '../server/config';\nexport const a = config;\n"],
    ['src/lib/schemas/probe.ts', "import { APP_URL } from 'astro:env/server';\nexport const a = APP_URL;\n"],
    ['src/lib/import/probe.ts', "import { z } from '../schemas/vocabulary';\nexport const a = z;\n"],
    ['src/lib/import/probe.ts', "import { z } from '../schemas';\nexport const a = z;\n"],
    ['src/lib/import/probe.ts', "import { Kysely } from 'kysely';\nexport const a = Kysely;\n"],
    ['src/lib/import/probe.ts', "import { readFileSync } from 'node:fs';\nexport const a = readFileSync;\n"],
    ['src/lib/import/probe.ts', "import { config } from '../server/config';\nexport const a = config;\n"],
    ['src/lib/lab/probe.ts', "import { readFileSync } from 'node:fs';\nexport const a = readFileSync;\n"],
    ['src/lib/lab/probe.ts', "import { sql } from 'kysely';\nexport const a = sql;\n"],
    ['src/lib/lab/probe.ts', "import { db } from '../server/app-context';\nexport const a = db;\n"],
    ['src/components/dev/probe.tsx', "import { db } from '../../lib/server/app-context';\nexport const a = db;\n"],
    ['src/components/dev/probe.tsx', "import pg from 'pg';\nexport const a = pg;\n"],
    ['fakes/mail/probe.ts', "import { config } from '../../src/lib/server/config';\nexport const a = config;\n"],
    ['migrations/probe.ts', "import { config } from '../src/lib/server/config';\nexport const a = config;\n"],
    ['src/lib/contracts/probe.ts', "import { Kysely } from 'kysely';\nexport const a = Kysely;\n"],
    ['src/lib/contracts/probe.ts', "import { config } from '../server/config';\nexport const a = config;\n"],
    ['src/pages/api/probe.ts', "import { sql } from 'kysely';\nexport const a = sql;\n"],
    ['src/pages/api/probe.ts', "import { appContext } from '../../lib/server/app-context';\nexport const a = appContext;\n"],
    [
      'src/pages/api/probe.ts',
      "import { connectDatabase } from '../../lib/server/db/connect';\nexport const a = connectDatabase;\n",
    ],
    ['src/lib/server/records/probe.ts', "import { ApiError } from '../http/api-error';\nexport const a = ApiError;\n"],
  ])('refuses in %s: %s', (path, source) => {
    expect(restrictedImports(path, source)).toBeGreaterThan(0);
  });

  it.each([
    ['src/lib/consolidation/probe.ts', "import { z } from 'zod';\nexport const a = z;\n"],
    ['src/lib/import/probe.ts', "import { z } from 'zod';\nexport const a = z;\n"],
    ['src/lib/schemas/probe.ts', "import { IMPORT_FIELDS } from '../import/fields';\nexport const a = IMPORT_FIELDS;\n"],
    ['src/lib/lab/probe.ts', "import Papa from 'papaparse';\nexport const a = Papa;\n"],
    ['src/components/dev/probe.tsx', "import { useState } from 'react';\nexport const a = useState;\n"],
    ['src/lib/server/probe.ts', "import pg from 'pg';\nexport const a = pg;\n"],
    ['src/lib/contracts/probe.ts', "import { z } from 'zod';\nexport const a = z;\n"],
    ['src/lib/server/http/probe.ts', "import { ApiError } from './api-error';\nexport const a = ApiError;\n"],
    [
      'src/pages/api/probe.ts',
      "import { listRecords } from '../../lib/server/records/record-service';\nexport const a = listRecords;\n",
    ],
  ])('allows in %s: %s', (path, source) => {
    expect(restrictedImports(path, source)).toBe(0);
  });
});
