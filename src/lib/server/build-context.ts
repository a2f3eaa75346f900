import type { Kysely } from 'kysely';
import { recordAudit } from './audit/audit-log';
import { type Auth, type AuthDependencies, createAuth } from './auth/create-auth';
import { membershipsOf } from './auth/memberships';
import { databaseRateLimiter, type RateLimitStorage } from './auth/rate-limit';
import { connectDatabase, type DatabaseHandle } from './db/connect';
import type { Database } from './db/schema';
import type { Mailer } from './mail/mailer';
import { type OutboxWorker, startOutboxWorker } from './mail/outbox';

export interface AppContext {
  database: DatabaseHandle;
  mailer: Mailer;
  auth: Auth;
  rateLimiter: RateLimitStorage;
  /** delivers queued mail; running only in the app server, not in scripts and tests */
  outbox: OutboxWorker | null;
}

/** Wires auth to the database, mail and audit log; shared by the app and by scripts that seed or test. */
export function buildAppContext(options: {
  databaseUrl: string;
  appUrl: string;
  authSecret: string;
  mailer: Mailer;
  extraPlugins?: AuthDependencies['extraPlugins'];
  startOutbox?: boolean;
}): AppContext {
  const database = connectDatabase(options.databaseUrl);
  const db: Kysely<Database> = database.db;
  const rateLimiter = databaseRateLimiter(db);
  const auth = createAuth({
    pool: database.pool,
    appUrl: options.appUrl,
    secret: options.authSecret,
    sendMail: (mail) => options.mailer.send(mail),
    rateLimitStorage: rateLimiter,
    events: {
      signedIn: ({ userId, ipAddress }) =>
        recordAudit(db, { actorUserId: userId, firmId: null, action: 'auth.sign_in', ipAddress }),
      firstFirmOf: async (userId) => (await membershipsOf(db, userId))[0]?.firmId ?? null,
    },
    extraPlugins: options.extraPlugins,
  });
  const outbox = options.startOutbox ? startOutboxWorker(db, options.mailer) : null;
  return { database, mailer: options.mailer, auth, rateLimiter, outbox };
}
