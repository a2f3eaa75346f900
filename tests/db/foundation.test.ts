import { sql } from 'kysely';
import { afterAll, describe, expect, it } from 'vitest';
import { connectDatabase } from '../../src/lib/server/db/connect';
import { testEnv } from '../support/env';

const app = connectDatabase(testEnv('CLAYBANK_TEST_DATABASE_URL'), { max: 2 });
const owner = connectDatabase(testEnv('CLAYBANK_TEST_OWNER_URL'), { max: 2 });
afterAll(async () => {
  await app.db.destroy();
  await owner.db.destroy();
});

describe('database foundation', () => {
  it('has run every migration in migrations/', async () => {
    const { readdirSync } = await import('node:fs');
    const files = readdirSync(new URL('../../migrations', import.meta.url)).map((name) => name.replace(/\.ts$/, ''));
    const { rows } = await sql<{ name: string }>`select name from kysely_migration order by name`.execute(owner.db);
    expect(rows.map((row) => row.name)).toEqual(files.sort());
  });

  it('loaded the invented demo scenario once', async () => {
    const row = await app.db
      .selectFrom('app_setting')
      .select('value')
      .where('key', '=', 'demo_scenario')
      .executeTakeFirstOrThrow();
    expect(row.value).toMatchObject({ name: 'Saltreach (invented)' });
  });

  it('returns numeric and bigint columns as numbers, not strings', async () => {
    const { rows } = await sql<{ cc: number; n: number }>`select 0.415::numeric as cc, 12::bigint as n`.execute(app.db);
    expect(rows[0]).toEqual({ cc: 0.415, n: 12 });
  });

  it('connects the app as a role that is not superuser, has no BYPASSRLS and owns no table', async () => {
    const { rows } = await sql<{ rolsuper: boolean; rolbypassrls: boolean; owned: number }>`
      select r.rolsuper, r.rolbypassrls,
             (select count(*) from pg_class c where c.relowner = r.oid and c.relnamespace = 'public'::regnamespace) as owned
      from pg_roles r where r.rolname = current_user`.execute(app.db);
    expect(rows[0]).toEqual({ rolsuper: false, rolbypassrls: false, owned: 0 });
  });

  it('does not let the app role change the schema', async () => {
    await expect(sql`create table intruder (id int)`.execute(app.db)).rejects.toThrow(/permission denied/);
  });
});
