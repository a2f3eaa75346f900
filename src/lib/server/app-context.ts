import { config } from './config';
import { connectDatabase, type DatabaseHandle } from './db/connect';
import { createMailer, type Mailer } from './mail/mailer';

interface AppContext {
  database: DatabaseHandle;
  mailer: Mailer;
}

const holder = globalThis as typeof globalThis & { __claybank?: AppContext };

export class MissingConfigurationError extends Error {
  constructor(readonly variable: string) {
    super(`${variable} is not set`);
    this.name = 'MissingConfigurationError';
  }
}

/** The process-wide database pool and mailer, created on first use. */
export function appContext(): AppContext {
  if (holder.__claybank) return holder.__claybank;
  if (!config.databaseUrl) throw new MissingConfigurationError('DATABASE_URL');
  holder.__claybank = {
    database: connectDatabase(config.databaseUrl),
    mailer: createMailer(config.smtpUrl, config.mailFrom),
  };
  return holder.__claybank;
}

export const db = () => appContext().database.db;
