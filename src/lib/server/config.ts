import {
  APP_MODE,
  APP_URL,
  BETTER_AUTH_SECRET,
  DATABASE_URL,
  MAIL_FROM,
  MAIL_INBOX_URL,
  MEILISEARCH_KEY,
  MEILISEARCH_URL,
  RECORD_KEY_SECRET,
  SMTP_URL,
} from 'astro:env/server';

/** The app's configuration, read once from astro:env (see README "Configuration"). */
export const config = {
  appUrl: APP_URL,
  isDevelopment: APP_MODE === 'development',
  databaseUrl: DATABASE_URL ?? null,
  authSecret: BETTER_AUTH_SECRET ?? null,
  smtpUrl: SMTP_URL,
  mailFrom: MAIL_FROM,
  mailInboxUrl: MAIL_INBOX_URL ?? null,
  meilisearchUrl: MEILISEARCH_URL ?? null,
  meilisearchKey: MEILISEARCH_KEY ?? null,
  /** Secret of the records' masking keys for pooled statistics; long-lived, never rotated. */
  recordKeySecret: RECORD_KEY_SECRET ?? null,
} as const;
