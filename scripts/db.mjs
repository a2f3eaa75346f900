// npm run db:migrate — applies pending migrations.
//   With DATABASE_OWNER_URL set: to that database (e.g. a managed PostgreSQL).
//   Without: to the local cluster of this checkout (started for the purpose and stopped after).
import { resolve } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';

ensureDependencies(resolve(import.meta.dirname, '..'));
const { cleanup } = await import('./lib/children.mjs');
const { runMain } = await import('./lib/errors.mjs');
const { settings } = await import('./lib/settings.mjs');
const stack = await import('./lib/stack.mjs');

await runMain(async () => {
  const command = process.argv[2];
  if (command !== 'migrate') throw new Error(`unknown command ${command}; use: node scripts/db.mjs migrate`);
  if (process.env.DATABASE_OWNER_URL) {
    stack.migrate(process.env.DATABASE_OWNER_URL);
    return;
  }
  const { urls } = await stack.bringUpDatabase({ database: settings.database });
  stack.migrate(urls.ownerUrl);
});
await cleanup();
