// Roles and databases inside the local cluster. The owner role owns the schema and runs the
// migrations; the app role owns nothing and has no BYPASSRLS, so row-level security binds it.
import pg from 'pg';
import { RunbookError } from './errors.mjs';
import { settings } from './settings.mjs';

async function withClient(url, fn) {
  const client = new pg.Client({ connectionString: url });
  try {
    await client.connect();
  } catch (error) {
    if (/password authentication failed/i.test(String(error.message))) {
      throw new RunbookError(
        'The local database refused the saved password (the file .data/local-secrets.json no longer matches the cluster).\n' +
          '  If the local data can be thrown away, stop Claybank and delete the cluster folder printed above, then start again.',
      );
    }
    throw error;
  }
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

const ident = (name) => `"${name.replaceAll('"', '""')}"`;
const literal = (value) => `'${String(value).replaceAll("'", "''")}'`;

/** Creates (or refreshes the passwords of) the owner and app roles. */
export async function ensureRoles(superUrl, secrets) {
  await withClient(superUrl, async (client) => {
    const roles = [
      [settings.ownerRole, secrets.pgOwnerPassword, 'LOGIN NOSUPERUSER NOBYPASSRLS NOCREATEDB NOCREATEROLE'],
      [settings.appRole, secrets.pgAppPassword, 'LOGIN NOSUPERUSER NOBYPASSRLS NOCREATEDB NOCREATEROLE NOINHERIT'],
    ];
    for (const [role, password, attributes] of roles) {
      const exists = await client.query('select 1 from pg_roles where rolname = $1', [role]);
      const verb = exists.rowCount ? 'ALTER' : 'CREATE';
      await client.query(`${verb} ROLE ${ident(role)} WITH ${attributes} PASSWORD ${literal(password)}`);
    }
  });
}

/** Creates the database when missing; returns true when it was created now. */
export async function ensureDatabase(superUrl, database, { fresh = false } = {}) {
  const created = await withClient(superUrl, async (client) => {
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${ident(database)} WITH (FORCE)`);
    const exists = await client.query('select 1 from pg_database where datname = $1', [database]);
    if (exists.rowCount) return false;
    await client.query(`CREATE DATABASE ${ident(database)} OWNER ${ident(settings.ownerRole)} ENCODING 'UTF8'`);
    return true;
  });
  const dbUrl = superUrl.replace(/\/postgres$/, `/${database}`);
  await withClient(dbUrl, async (client) => {
    const app = ident(settings.appRole);
    const owner = ident(settings.ownerRole);
    await client.query(`REVOKE ALL ON DATABASE ${ident(database)} FROM PUBLIC`);
    await client.query(`GRANT CONNECT, TEMPORARY ON DATABASE ${ident(database)} TO ${app}`);
    await client.query(`ALTER SCHEMA public OWNER TO ${owner}`);
    await client.query('REVOKE CREATE ON SCHEMA public FROM PUBLIC');
    await client.query(`GRANT USAGE ON SCHEMA public TO ${app}`);
    await client.query(
      `ALTER DEFAULT PRIVILEGES FOR ROLE ${owner} IN SCHEMA public GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO ${app}`,
    );
    await client.query(`ALTER DEFAULT PRIVILEGES FOR ROLE ${owner} IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO ${app}`);
    await client.query(`ALTER DEFAULT PRIVILEGES FOR ROLE ${owner} IN SCHEMA public GRANT EXECUTE ON FUNCTIONS TO ${app}`);
  });
  return created;
}

/** Drops databases left behind by test runs whose process is gone. */
export async function dropStaleTestDatabases(superUrl) {
  await withClient(superUrl, async (client) => {
    const { rows } = await client.query("select datname from pg_database where datname like 'claybank_test_%'");
    for (const { datname } of rows) {
      const pid = Number(datname.split('_').pop());
      let alive = false;
      try {
        process.kill(pid, 0);
        alive = true;
      } catch {}
      if (!alive) await client.query(`DROP DATABASE IF EXISTS ${ident(datname)} WITH (FORCE)`);
    }
  });
}

export async function dropDatabase(superUrl, database) {
  await withClient(superUrl, (client) => client.query(`DROP DATABASE IF EXISTS ${ident(database)} WITH (FORCE)`));
}
