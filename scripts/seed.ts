// Loads the invented Saltreach demo scenario once per database (marker in app_setting): firms,
// people for every role, regions and geological units. Connects as the app role, through the same
// services the app uses.
//   DATABASE_URL=… BETTER_AUTH_SECRET=… APP_URL=… tsx scripts/seed.ts
import { writeFileSync } from 'node:fs';
import { buildAppContext } from '../src/lib/server/build-context';
import { inTenantTransaction } from '../src/lib/server/tenancy/tenant-transaction';
import { DEMO_PASSWORD, DEMO_PEOPLE } from './demo/people';
import { seedPeople } from './demo/seed-people';
import { seedRecords } from './demo/seed-records';
import { seedVocabulary } from './demo/seed-vocabulary';

const SCENARIO = { name: 'Saltreach (invented)', version: 3 };

function required(name: string): string {
  const value = process.env[name];
  if (!value) {
    console.error(`${name} is not set.`);
    process.exit(1);
  }
  return value;
}

const ctx = buildAppContext({
  databaseUrl: required('DATABASE_URL'),
  appUrl: required('APP_URL'),
  authSecret: required('BETTER_AUTH_SECRET'),
  mailer: { send: async () => {}, verify: async () => {} },
});
const db = ctx.database.db;

const marker = await db.selectFrom('app_setting').select('value').where('key', '=', 'demo_scenario').executeTakeFirst();
const loaded = marker?.value as { version?: number } | undefined;
if (loaded?.version === SCENARIO.version) {
  console.log('  demo scenario already loaded');
} else {
  await seedPeople(ctx);
  await seedVocabulary(db);
  const already = await inTenantTransaction(db, { firmId: null, platformRole: 'steward' }, (trx) =>
    trx.selectFrom('submission').select('id').limit(1).executeTakeFirst(),
  );
  const bank = already ? null : await seedRecords(ctx);
  if (bank) console.log(`  demo bank: ${bank.records} invented test records in ${bank.submissions} submissions`);
  const value = JSON.stringify({ ...SCENARIO, loadedAt: new Date().toISOString() });
  await db
    .insertInto('app_setting')
    .values({ key: 'demo_scenario', value })
    .onConflict((oc) => oc.column('key').doUpdateSet({ value, updated_at: new Date() }))
    .execute();
  console.log(`  demo scenario loaded: ${SCENARIO.name}, ${DEMO_PEOPLE.length} people, regions and geological units`);
}

const signInsFile = process.env.CLAYBANK_DEMO_SIGN_INS_FILE;
if (signInsFile) {
  const people = DEMO_PEOPLE.map((p) => ({ role: p.label, email: p.email, password: DEMO_PASSWORD }));
  writeFileSync(signInsFile, JSON.stringify(people, null, 2), { mode: 0o600 });
}
await db.destroy();
