import { type Kysely, sql } from 'kysely';
import type { Database } from '../db/schema';
import type { Mailer, OutgoingMail } from './mailer';

export interface QueuedMail extends OutgoingMail {
  /** what the mail is about, e.g. submission_received */
  kind: string;
  /** the same key is never queued twice */
  dedupeKey?: string;
}

/**
 * Queues mail in the same transaction as the change it reports, so a mail failure never loses data
 * and a rolled-back change sends nothing. The worker below delivers it.
 */
export async function enqueueMail(db: Kysely<Database>, mails: QueuedMail[]): Promise<void> {
  if (mails.length === 0) return;
  await db
    .insertInto('mail_outbox')
    .values(
      mails.map((mail) => ({
        to_address: mail.to,
        subject: mail.subject,
        body_text: mail.text,
        body_html: mail.html ?? null,
        kind: mail.kind,
        dedupe_key: mail.dedupeKey ?? null,
      })),
    )
    .onConflict((oc) => oc.column('dedupe_key').doNothing())
    .execute();
}

const BATCH = 20;
const LEASE_SECONDS = 60;
const MAX_BACKOFF_SECONDS = 3600;

/**
 * Delivers queued mail: claims a batch (SKIP LOCKED, so several app servers share the work), leases
 * it for a minute, sends, and marks it sent; a failure is retried with a growing delay. Returns how
 * many were sent.
 */
export async function deliverQueuedMail(db: Kysely<Database>, mailer: Mailer): Promise<number> {
  const claimed = await sql<{
    id: number;
    to_address: string;
    subject: string;
    body_text: string;
    body_html: string | null;
    attempts: number;
  }>`
    update mail_outbox set attempts = attempts + 1, send_after = now() + make_interval(secs => ${LEASE_SECONDS})
    where id in (
      select id from mail_outbox where sent_at is null and send_after <= now() order by id limit ${BATCH} for update skip locked
    )
    returning id, to_address, subject, body_text, body_html, attempts`.execute(db);
  let sent = 0;
  for (const mail of claimed.rows) {
    try {
      await mailer.send({ to: mail.to_address, subject: mail.subject, text: mail.body_text, html: mail.body_html ?? undefined });
      await db.updateTable('mail_outbox').set({ sent_at: new Date(), last_error: null }).where('id', '=', mail.id).execute();
      sent++;
    } catch (error) {
      const backoff = Math.min(MAX_BACKOFF_SECONDS, 15 * 2 ** Math.min(mail.attempts, 10));
      await db
        .updateTable('mail_outbox')
        .set({
          last_error: error instanceof Error ? error.message.slice(0, 500) : 'send failed',
          send_after: sql`now() + make_interval(secs => ${backoff})`,
        })
        .where('id', '=', mail.id)
        .execute();
    }
  }
  return sent;
}

export interface OutboxWorker {
  /** deliver soon (after a change was committed) instead of waiting for the next tick */
  kick(): void;
  stop(): void;
}

/** Polls the outbox every few seconds in this process. */
export function startOutboxWorker(db: Kysely<Database>, mailer: Mailer, intervalMs = 2000): OutboxWorker {
  let running = false;
  let again = false;
  const tick = async () => {
    if (running) {
      again = true;
      return;
    }
    running = true;
    try {
      do {
        again = false;
        while ((await deliverQueuedMail(db, mailer)) === BATCH) {}
      } while (again);
    } catch (error) {
      console.error('[outbox] delivery round failed:', error instanceof Error ? error.message : error);
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), intervalMs);
  timer.unref();
  return {
    kick: () => void tick(),
    stop: () => clearInterval(timer),
  };
}
