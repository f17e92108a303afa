// A fresh, fully migrated database per call and the app built on it. Shared by the API tests
// (supertest on `app`) and the end-to-end tests (startTestServer). SQLite by default; in the
// vitest project `postgres` (tests/pg/setup.ts sets LATCHET_TEST_PG_URL) an empty PostgreSQL
// database at the latest level instead (tests/helpers/pg-test-db.ts).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Express } from 'express';
import type { Knex } from 'knex';
import nodemailer from 'nodemailer';
import { createApp, internalsOf, type AppDeps } from '../../server/app.ts';
import { startFakeSmtp, type Mailbox } from '../../server/modules/mail/fake-smtp.ts';
import { loadConfig, type Config } from '../../server/config.ts';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { freshDatabase } from './pg-test-db.ts';

/** True when this test run's databases are PostgreSQL (to skip checks of SQLite itself). */
export const onPostgres = (): boolean => Boolean(process.env.LATCHET_TEST_PG_URL);

export interface TestApp {
  app: Express;
  db: Knex;
  config: Config;
  /** What the fake SMTP server (127.0.0.1, a free port) received from this app. */
  mailbox: Mailbox;
  /** Sends every queued mail now and waits for it. */
  flushMail(): Promise<void>;
  /** Unexpected errors the app logged (500s). */
  errors: unknown[];
  /** Closes the database and deletes its folder. */
  close(): Promise<void>;
}

export interface TestAppOptions {
  /** Environment variables on top of the test defaults, e.g. { AUTH_RATE_LIMIT: '3' }. */
  env?: Record<string, string>;
  /** Changes to the parsed config (applied last). */
  config?: Partial<Config>;
  /** Other createApp dependencies (e.g. clientDir). */
  deps?: Partial<Omit<AppDeps, 'db' | 'config'>>;
}

/** Builds the app on a new temporary database, migrated to the latest level. */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'latchet-test-'));
  const file = join(dir, 'test.sqlite3');
  const pgServer = process.env.LATCHET_TEST_PG_URL;
  const pg = pgServer ? await freshDatabase(pgServer, process.env.LATCHET_TEST_PG_TEMPLATE || undefined) : null;
  const env = { NODE_ENV: 'test', DATABASE_FILE: file, ...(pg ? { DATABASE_URL: pg.url } : {}), PORT: '0', ...options.env };
  const config = { ...loadConfig(env), ...options.config };
  const db = openDb(pg ? pg.url : file);
  // A PostgreSQL test database is a copy of the template the run migrated at its start.
  if (!pg || !process.env.LATCHET_TEST_PG_TEMPLATE) await migrateLatest(db);
  const errors: unknown[] = [];
  const smtp = await startFakeSmtp();
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: smtp.port, secure: false, ignoreTLS: true });
  const app = createApp({ db, config, log: (e) => errors.push(e), mail: { transport, mailbox: smtp.mailbox }, ...options.deps });
  const { outbox } = internalsOf(app);
  return {
    app,
    db,
    config,
    mailbox: smtp.mailbox,
    flushMail: () => outbox.flush(),
    errors,
    async close() {
      await outbox.flush().catch(() => undefined);
      transport.close();
      await smtp.close();
      await db.destroy();
      await pg?.release();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
