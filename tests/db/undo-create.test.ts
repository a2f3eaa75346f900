// The sign-in library stores a firm, an API key or an invitation on its own connection; when the audit
// entry written after it fails, the new row is taken back out, so a failed request leaves nothing.
// The failure is the one a probe found: text with an unpaired surrogate, which the library stores but
// PostgreSQL's jsonb refuses in the audit summary. (The HTTP body reader now refuses such text before
// any of this runs; these tests call the services directly to prove the second line of defence.)
// source: OWASP ASVS 5.0 §2.3.3 (an operation succeeds in full or not at all); PostgreSQL 15 docs
// §8.14.1 (jsonb refuses \u escapes that do not form valid Unicode).
import { randomUUID } from 'node:crypto';
import { testUtils } from 'better-auth/plugins';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resolveIdentity } from '../../src/lib/server/auth/resolve-actor';
import { buildAppContext } from '../../src/lib/server/build-context';
import { createApiKey } from '../../src/lib/server/firms/api-key-service';
import type { FirmCaller } from '../../src/lib/server/firms/firm-caller';
import { createFirm } from '../../src/lib/server/firms/firm-service';
import { inviteMember } from '../../src/lib/server/firms/invitation-service';
import { testEnv } from '../support/env';

const ctx = buildAppContext({
  databaseUrl: testEnv('CLAYBANK_TEST_DATABASE_URL'),
  appUrl: 'http://127.0.0.1:4321',
  authSecret: `undo-create-tests-${randomUUID()}`,
  mailer: { send: async () => undefined, verify: async () => undefined },
  extraPlugins: [testUtils()],
});
const db = ctx.database.db;
const app = { db, auth: ctx.auth };
const BROKEN = 'Quay \ud800 Partners';

let caller: FirmCaller;
let firmId = '';

/** A person signed in through the library, as an endpoint builds them (firmCallerOf). */
async function callerFor(userId: string): Promise<FirmCaller> {
  const helpers = (await ctx.auth.$context) as unknown as { test: { getAuthHeaders(o: { userId: string }): Promise<Headers> } };
  const headers = await helpers.test.getAuthHeaders({ userId });
  const session = await ctx.auth.api.getSession({ headers });
  if (!session) throw new Error('no session');
  return { headers, identity: await resolveIdentity(db, session), ipAddress: '192.0.2.1' };
}

beforeAll(async () => {
  const email = `undo.${randomUUID().slice(0, 8)}@example.test`;
  const { user } = await ctx.auth.api.createUser({
    body: { email, password: 'undo-test-password', name: 'Undo tester', data: { emailVerified: true } },
  });
  const firm = await ctx.auth.api.createOrganization({
    body: { name: 'Undo test firm (invented)', slug: `undo-${randomUUID().slice(0, 8)}`, userId: user.id },
  });
  if (!firm) throw new Error('no firm');
  firmId = firm.id;
  caller = await callerFor(user.id);
});
afterAll(() => db.destroy());

describe('a create whose audit entry fails leaves nothing behind', () => {
  it('firm: no firm, no owner membership, and the session keeps its active firm', async () => {
    const firmsBefore = await db.selectFrom('organization').select('id').execute();
    await expect(createFirm(app, caller, BROKEN)).rejects.toThrow();
    expect(await db.selectFrom('organization').select('id').execute()).toEqual(firmsBefore);
    const session = await ctx.auth.api.getSession({ headers: caller.headers });
    expect(session?.session.activeOrganizationId).toBe(firmId);
  });

  it('API key: no key is left whose secret nobody was shown', async () => {
    const before = await db.selectFrom('apikey').select('id').execute();
    await expect(createApiKey(app, caller, firmId, BROKEN)).rejects.toThrow();
    expect(await db.selectFrom('apikey').select('id').execute()).toEqual(before);
  });

  it('the same creates with sound text are stored and audited', async () => {
    const key = await createApiKey(app, caller, firmId, 'Lab export (invented)');
    const audit = await db.selectFrom('audit_log').select('action').where('object_id', '=', key.key.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['firm.api_key_created']);
  });

  it('invitation: none is left pending', async () => {
    // The library checks the address and role itself; here the audit entry fails on the caller's address.
    const failingAudit = { ...caller, ipAddress: '192.0.2.1\u0000' };
    const before = await db.selectFrom('invitation').select('id').where('organizationId', '=', firmId).execute();
    await expect(
      inviteMember(app, failingAudit, firmId, `guest.${randomUUID().slice(0, 8)}@example.test`, 'engineer'),
    ).rejects.toThrow();
    expect(await db.selectFrom('invitation').select('id').where('organizationId', '=', firmId).execute()).toEqual(before);
  });
});
