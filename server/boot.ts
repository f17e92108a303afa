// What `npm start` and the API half of `npm run dev` share: migrate, seed, listen, print.
import type { Knex } from 'knex';
import type { Config } from './config.ts';
import { describeDatabase, migrateLatest, openDb } from './db/connection.ts';
import { migrationLevel } from './db/migration-level.ts';
import { createAuthRepository } from './modules/auth/auth.repository.ts';
import { listen, stopOnSignals, type RunningServer } from './index.ts';
import { dirname, join } from 'node:path';
import { DEMO_PASSWORD, DEMO_USERS, seed as seedShop } from '../db/seeds/01-demo-shop.ts';
import { seed as seedPatterns } from '../db/seeds/02-demo-patterns.ts';
import { seed as seedOrders } from '../db/seeds/03-demo-orders.ts';
import type { AppDeps } from './app.ts';
import { startFakeSmtp } from './modules/mail/fake-smtp.ts';
import { smtpTransport } from './modules/mail/outbox.ts';

/** Migrates to the latest level and (re)seeds the demo shop. */
export async function prepareDatabase(config: Config): Promise<Knex> {
  const db = openDb(config);
  const applied = await migrateLatest(db);
  const level = await migrationLevel(db);
  // Sessions past their idle expiry are dead weight; lucia never sweeps them by itself.
  await createAuthRepository(db).deleteExpiredSessions(Date.now());
  console.log(`database ${describeDatabase(config)}: ${applied.length} migration(s) applied now, level ${level.level} (${level.latest})`);
  if (config.env !== 'production') {
    await seedShop(db);
    await seedPatterns(db);
    await seedOrders(db);
  }
  return db;
}

/**
 * Outside production without SMTP settings: a fake SMTP server on 127.0.0.1:SMTP_PORT (any
 * free port if taken) keeping what it receives beside the database, shown at /dev/mail.
 */
export async function prepareMail(config: Config): Promise<{ mail: AppDeps['mail']; close(): Promise<void>; note: string }> {
  if (config.env === 'production' || config.smtp.host) {
    return { mail: { transport: smtpTransport(config) }, close: async () => undefined, note: config.smtp.host ? `mail via ${config.smtp.host}:${config.smtp.port}` : 'mail: no SMTP_HOST set, messages are only recorded' };
  }
  const folder = join(dirname(config.databaseFile), 'dev-mailbox');
  const smtp = await startFakeSmtp({ port: config.smtp.port, folder }).catch(() => startFakeSmtp({ port: 0, folder }));
  return { mail: { transport: smtpTransport(config, smtp.port), mailbox: smtp.mailbox }, close: smtp.close, note: `fake SMTP server on 127.0.0.1:${smtp.port}` };
}

/** The lines that tell a newcomer how to sign in. */
export function demoSignIns(): string {
  const width = Math.max(...DEMO_USERS.map((u) => u.email.length));
  return [
    `Demo sign-ins (password for all: ${DEMO_PASSWORD})`,
    ...DEMO_USERS.map((u) => `  ${u.email.padEnd(width)}  ${u.role.padEnd(10)} ${u.name}`),
  ].join('\n');
}

/** Prepare the database, listen, and stop cleanly on signals. */
export async function boot(config: Config): Promise<RunningServer & { mailNote: string }> {
  const db = await prepareDatabase(config);
  const mail = await prepareMail(config);
  const running = await listen(config, db, mail.mail);
  stopOnSignals([running.stop, mail.close]);
  return { ...running, mailNote: mail.note };
}
