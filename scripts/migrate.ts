// Applies every migration in migrations/ that has not run yet, as the schema owner.
//   DATABASE_OWNER_URL=postgres://… tsx scripts/migrate.ts     (npm run db:migrate sets it locally)
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { FileMigrationProvider, Kysely, Migrator, PostgresDialect } from 'kysely';
import pg from 'pg';

const url = process.env.DATABASE_OWNER_URL;
if (!url) {
  console.error('DATABASE_OWNER_URL is not set: point it at the database as the role that owns the schema.');
  process.exit(1);
}

const db = new Kysely<unknown>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: url, max: 1 }) }) });
const migrator = new Migrator({
  db,
  provider: new FileMigrationProvider({ fs, path, migrationFolder: path.resolve(import.meta.dirname, '../migrations') }),
});

const { error, results } = await migrator.migrateToLatest();
for (const result of results ?? []) {
  const mark = result.status === 'Success' ? 'applied' : result.status === 'Error' ? 'FAILED' : 'not run';
  console.log(`  migration ${result.migrationName}: ${mark}`);
}
await db.destroy();
if (error) {
  console.error('Migration failed; nothing after the failed step was applied.', error);
  process.exit(1);
}
