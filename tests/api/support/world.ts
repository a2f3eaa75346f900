import { randomUUID } from 'node:crypto';
import { testUtils } from 'better-auth/plugins';
import type { Kysely } from 'kysely';
import { buildAppContext } from '../../../src/lib/server/build-context';
import type { Database } from '../../../src/lib/server/db/schema';
import { createMailer } from '../../../src/lib/server/mail/mailer';
import { inTenantTransaction } from '../../../src/lib/server/tenancy/tenant-transaction';
import { testEnv } from '../../support/env';

export const base = testEnv('CLAYBANK_TEST_BASE_URL');

/**
 * A test-side auth instance on the same database and secret as the server under test. It mints
 * sessions directly (better-auth's testUtils), so the many role × route checks do not trip the
 * sign-in rate limit; the cookies are the server's own format and are checked by the server.
 */
export const ctx = buildAppContext({
  databaseUrl: testEnv('CLAYBANK_TEST_DATABASE_URL'),
  appUrl: base,
  authSecret: testEnv('CLAYBANK_TEST_AUTH_SECRET'),
  mailer: createMailer(testEnv('CLAYBANK_TEST_SMTP_URL'), 'Claybank tests <tests@example.test>'),
  extraPlugins: [testUtils()],
});
export const db: Kysely<Database> = ctx.database.db;

/** A cookie header for a new session of the given person (active firm: their first). */
export async function sessionCookie(userId: string): Promise<string> {
  const helpers = (await ctx.auth.$context) as unknown as { test: { getAuthHeaders(o: { userId: string }): Promise<Headers> } };
  const headers = await helpers.test.getAuthHeaders({ userId });
  return headers.get('cookie') ?? '';
}

export async function userIdOf(email: string): Promise<string> {
  return (await db.selectFrom('user').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id;
}

export async function firmIdOf(slug: string): Promise<string> {
  return (await db.selectFrom('organization').select('id').where('slug', '=', slug).executeTakeFirstOrThrow()).id;
}

export async function memberIdOf(email: string, firmSlug: string): Promise<string> {
  const row = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select('member.id')
    .where('user.email', '=', email)
    .where('organization.slug', '=', firmSlug)
    .executeTakeFirstOrThrow();
  return row.id;
}

export interface CallResult {
  status: number;
  body: unknown;
  text: string;
  location: string | null;
}

/** One request to the server under test, as a browser on the app's own origin would send it. */
export async function call(
  method: string,
  path: string,
  cookie: string | null,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<CallResult> {
  const raw = body instanceof FormData || typeof body === 'string' || body instanceof Uint8Array;
  const response = await fetch(`${base}${path}`, {
    method,
    redirect: 'manual',
    headers: {
      origin: base,
      ...(cookie ? { cookie } : {}),
      ...(body !== undefined && !raw ? { 'content-type': 'application/json' } : {}),
      ...headers,
    },
    body: body === undefined ? undefined : raw ? (body as BodyInit) : JSON.stringify(body),
  });
  const text = await response.text();
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    parsed = null;
  }
  return { status: response.status, body: parsed, text, location: response.headers.get('location') };
}

/** A fresh invented person, verified, optionally a member of a firm. */
export async function makePerson(
  label: string,
  firm?: { id: string; role: string },
  platformRole: 'admin' | 'steward' | 'user' = 'user',
): Promise<{ id: string; email: string }> {
  const email = `${label}.${randomUUID().slice(0, 8)}@example.test`;
  const { user } = await ctx.auth.api.createUser({
    body: { email, password: 'matrix-test-password', name: label, role: platformRole, data: { emailVerified: true } },
  });
  if (firm) await ctx.auth.api.addMember({ body: { userId: user.id, organizationId: firm.id, role: firm.role as 'engineer' } });
  return { id: user.id, email };
}

export { inTenantTransaction };
