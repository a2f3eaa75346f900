// The server's layers, checked on the source text: repositories hold the SQL and take the caller's
// transaction, services hold the rules, endpoints hold neither (the lint rules in biome.json refuse
// their imports; import-boundaries.test.ts proves those rules bite).
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '../../..');
const serverDir = join(root, 'src/lib/server');

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    return entry.isDirectory() ? walk(path) : [path];
  });
}

const serverFiles = walk(serverDir).filter((file) => file.endsWith('.ts'));
const repositories = serverFiles.filter((file) => file.endsWith('-repository.ts'));
const QUERY = /\.(selectFrom|insertInto|updateTable|deleteFrom)\(|\bsql`|\bsql</;

/** Infrastructure that talks to the database below the features: the pool, auth's own tables, the mail queue. */
const INFRASTRUCTURE = [
  'db/bulk-insert.ts',
  'tenancy/tenant-transaction.ts',
  'auth/memberships.ts',
  'auth/rate-limit.ts',
  'mail/outbox.ts',
  'health/health-service.ts',
];

describe('repositories hold the SQL', () => {
  it('finds the repositories', () => {
    expect(repositories.length).toBeGreaterThanOrEqual(8);
  });

  it.each(repositories.map((file) => [relative(serverDir, file)]))(
    '%s: every exported function takes the transaction first',
    (name) => {
      const text = readFileSync(join(serverDir, name), 'utf8');
      const exported = [...text.matchAll(/export (?:async )?function (\w+)(?:<[^>]*>)?\(\s*([^,)]*)/g)];
      expect(exported.length).toBeGreaterThan(0);
      for (const [, fn, first] of exported) expect(`${fn}(${first}`).toBe(`${fn}(trx: Transaction<Database>`);
    },
  );

  it('no service, endpoint or page outside the repositories and the infrastructure runs a query', () => {
    const pages = walk(join(root, 'src/pages'));
    const offenders = [...serverFiles, ...pages]
      .filter((file) => !file.endsWith('-repository.ts'))
      .filter((file) => !INFRASTRUCTURE.includes(relative(serverDir, file)))
      .filter((file) => QUERY.test(readFileSync(file, 'utf8')))
      .map((file) => relative(root, file));
    expect(offenders).toEqual([]);
  });
});
