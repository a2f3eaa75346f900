import type { Kysely } from 'kysely';
import type { Auth } from './auth/create-auth';
import type { RateLimitStorage } from './auth/rate-limit';
import type { AppContext } from './build-context';
import type { Database } from './db/schema';
import type { Mailer } from './mail/mailer';

/**
 * The process-wide dependencies an endpoint hands to services (`handleApi((context, app) => …)`).
 * Services take the parts they need (`Pick<AppServices, 'db' | 'appUrl'>`), so tests and scripts
 * call them with their own database.
 */
export interface AppServices {
  db: Kysely<Database>;
  auth: Auth;
  mailer: Mailer;
  rateLimiter: RateLimitStorage;
  /** the address people open, for links in mail */
  appUrl: string;
  /** deliver queued mail now, after a change that queued some was committed */
  kickOutbox(): void;
}

/** The services of an already built context (scripts and tests build their own). */
export function servicesOf(context: AppContext, appUrl: string): AppServices {
  return {
    db: context.database.db,
    auth: context.auth,
    mailer: context.mailer,
    rateLimiter: context.rateLimiter,
    appUrl,
    kickOutbox: () => context.outbox?.kick(),
  };
}

/**
 * Services that build their context on first use: a route that touches none of them (the template,
 * a refused request) never opens the database.
 */
export function lazyServicesOf(context: () => AppContext, appUrl: string): AppServices {
  return {
    get db() {
      return context().database.db;
    },
    get auth() {
      return context().auth;
    },
    get mailer() {
      return context().mailer;
    },
    get rateLimiter() {
      return context().rateLimiter;
    },
    appUrl,
    kickOutbox: () => context().outbox?.kick(),
  };
}
