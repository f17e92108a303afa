// Sends queued mail after the transaction that queued it has committed. One flush runs at a
// time; a failed message is retried on the next flushes and given up after MAX_ATTEMPTS.
import nodemailer, { type Transporter } from 'nodemailer';
import type { Knex } from 'knex';
import type { Config } from '../../config.ts';
import { createMailRepository, type OutgoingMail } from './mail.repository.ts';

/** Delivery attempts before a message is marked failed. */
export const MAX_ATTEMPTS = 3;
/** Wait before retrying when a whole batch failed, ms. */
export const RETRY_AFTER_MS = 30_000;

export interface Outbox {
  /** Queue `mail` inside the caller's transaction `trx`; returns the row id. */
  enqueue(trx: Knex, mail: OutgoingMail): Promise<number>;
  /** Start sending what is queued (does not wait). */
  kick(): void;
  /** Send what is queued now; resolves when the queue is empty or only failures remain. */
  flush(): Promise<void>;
  /** Status of one queued message after a flush. */
  statusOf(id: number): Promise<'queued' | 'sent' | 'failed' | undefined>;
}

/** SMTP transport from the config (production), or to a local port (the fake server). */
export function smtpTransport(config: Config, localPort?: number): Transporter {
  if (localPort !== undefined) return nodemailer.createTransport({ host: '127.0.0.1', port: localPort, secure: false, ignoreTLS: true });
  if (!config.smtp.host) {
    // No SMTP anywhere: keep the record in outgoing_mail, deliver nowhere.
    return nodemailer.createTransport({ jsonTransport: true });
  }
  return nodemailer.createTransport({
    host: config.smtp.host,
    port: config.smtp.port,
    secure: config.smtp.secure,
    ...(config.smtp.user ? { auth: { user: config.smtp.user, pass: config.smtp.password ?? '' } } : {}),
  });
}

/** How the outbox waits before a retry and reads the time; tests inject both (no real waits). */
export interface OutboxTimers {
  /** Calls `run` after `ms`; returns a cancel function. Must not keep a stopping process alive. */
  schedule(run: () => void, ms: number): () => void;
  /** ms since the epoch. */
  now(): number;
}

const realTimers: OutboxTimers = {
  schedule(run, ms) {
    const timer = setTimeout(run, ms);
    // A pending retry must not keep a stopping process alive.
    timer.unref();
    return () => clearTimeout(timer);
  },
  now: () => Date.now(),
};

export function createOutbox(db: Knex, transport: Transporter, from: string, log: (msg: string) => void = console.error, timers: OutboxTimers = realTimers): Outbox {
  const repo = createMailRepository(db);
  let running: Promise<void> | null = null;
  let again = false;

  async function drain(): Promise<void> {
    for (;;) {
      const batch = await repo.queued(20);
      if (batch.length === 0) return;
      let progressed = false;
      for (const row of batch) {
        try {
          await transport.sendMail({ from, to: row.to_email, subject: row.subject, text: row.text_body, html: row.html_body });
          await repo.markSent(row.id, timers.now());
          progressed = true;
        } catch (err) {
          const giveUp = row.attempts + 1 >= MAX_ATTEMPTS;
          await repo.markFailed(row.id, (err as Error).message, giveUp);
          log(`mail ${row.id} to ${row.to_email} ${giveUp ? 'failed' : 'will be retried'}: ${(err as Error).message}`);
        }
      }
      if (!progressed) {
        // Nothing went out (the server is down?): try again later instead of spinning.
        scheduleRetry();
        return;
      }
    }
  }

  let retry: (() => void) | undefined;
  function scheduleRetry(): void {
    if (retry) return;
    retry = timers.schedule(() => {
      retry = undefined;
      flush().catch((err: Error) => log(`mail retry: ${err.message}`));
    }, RETRY_AFTER_MS);
  }

  function flush(): Promise<void> {
    if (running) {
      again = true;
      return running;
    }
    running = (async () => {
      try {
        do {
          again = false;
          await drain();
        } while (again);
      } finally {
        running = null;
      }
    })();
    return running;
  }

  return {
    enqueue: (trx, mail) => repo.enqueue(trx, mail, timers.now()),
    kick: () => {
      flush().catch((err: Error) => log(`mail flush: ${err.message}`));
    },
    flush,
    statusOf: async (id) => (await repo.byId(id))?.status,
  };
}
