// Prints the SQL that better-auth's current options need, compared with the database at
// DATABASE_OWNER_URL. Use it against an empty database when auth options change, and freeze the
// output in a new migration (better-auth's own CLI does not run on Node 20).
//   DATABASE_OWNER_URL=postgres://… tsx scripts/auth-schema.ts
import { getMigrations } from 'better-auth/db/migration';
import pg from 'pg';
import { createAuth } from '../src/lib/server/auth/create-auth';

const url = process.env.DATABASE_OWNER_URL;
if (!url) {
  console.error('DATABASE_OWNER_URL is not set.');
  process.exit(1);
}
const pool = new pg.Pool({ connectionString: url, max: 1 });
const auth = createAuth({
  pool,
  appUrl: 'http://127.0.0.1:4321',
  secret: 'schema-generation-only-secret-000000000',
  sendMail: async () => {},
  rateLimitStorage: { consume: async () => ({ allowed: true, retryAfter: null }), giveBack: async () => {} },
  events: { signedIn: async () => {}, firstFirmOf: async () => null },
});
const migrations = await getMigrations(auth.options);
console.log(await migrations.compileMigrations());
await pool.end();
