// Loads the invented demo scenario once per database (marker in app_setting). Later capabilities
// add their parts of the scenario here.
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';

const SCENARIO = { name: 'Saltreach (invented)', version: 1 };

const url = process.env.DATABASE_OWNER_URL;
if (!url) {
  console.error('DATABASE_OWNER_URL is not set.');
  process.exit(1);
}
const db = new Kysely<{ app_setting: { key: string; value: string } }>({
  dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: url, max: 1 }) }),
});

const existing = await db.selectFrom('app_setting').select('value').where('key', '=', 'demo_scenario').executeTakeFirst();
if (existing) {
  console.log('  demo scenario already loaded');
} else {
  await db
    .insertInto('app_setting')
    .values({ key: 'demo_scenario', value: JSON.stringify({ ...SCENARIO, loadedAt: new Date().toISOString() }) })
    .execute();
  console.log(`  demo scenario loaded: ${SCENARIO.name}`);
}
await db.destroy();
