import { type AppServices, lazyServicesOf } from './app-services';
import { type AppContext, buildAppContext } from './build-context';
import { config } from './config';
import { createMailer } from './mail/mailer';

const holder = globalThis as typeof globalThis & { __claybank?: AppContext; __claybankServices?: AppServices };

export class MissingConfigurationError extends Error {
  constructor(readonly variable: string) {
    super(`${variable} is not set`);
    this.name = 'MissingConfigurationError';
  }
}

/** The process-wide database pool, auth and mailer, created on first use. */
export function appContext(): AppContext {
  if (holder.__claybank) return holder.__claybank;
  if (!config.databaseUrl) throw new MissingConfigurationError('DATABASE_URL');
  if (!config.authSecret) throw new MissingConfigurationError('BETTER_AUTH_SECRET');
  holder.__claybank = buildAppContext({
    databaseUrl: config.databaseUrl,
    appUrl: config.appUrl,
    authSecret: config.authSecret,
    mailer: createMailer(config.smtpUrl, config.mailFrom),
    startOutbox: true,
  });
  return holder.__claybank;
}

/** The app's services, as the middleware puts them in `locals.app` for every request. */
export function appServices(): AppServices {
  holder.__claybankServices ??= lazyServicesOf(appContext, config.appUrl);
  return holder.__claybankServices;
}
