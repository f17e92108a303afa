// A real HTTP server on 127.0.0.1 and a free port, serving the API and the built client
// (dist/client) from a fresh database: for end-to-end tests in Chromium.
import type { AddressInfo } from 'node:net';
import type { Knex } from 'knex';
import type { Mailbox } from '../../server/modules/mail/fake-smtp.ts';
import { createTestApp, type TestAppOptions } from './test-app.ts';

export interface TestServer {
  /** e.g. http://127.0.0.1:41234 (no trailing slash). */
  url: string;
  db: Knex;
  /** Mail the app sent (invites, notifications); also shown at /dev/mail to a signed-in owner. */
  mailbox: Mailbox;
  close(): Promise<void>;
}

export async function startTestServer(options: TestAppOptions = {}): Promise<TestServer> {
  const t = await createTestApp(options);
  const server = t.app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve, reject) => server.once('listening', resolve).once('error', reject));
  const { port } = server.address() as AddressInfo;
  const url = `http://127.0.0.1:${port}`;
  // Mail links and the Origin check should name the address the browser actually uses.
  t.config.publicOrigin = url;
  return {
    url,
    db: t.db,
    mailbox: t.mailbox,
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await t.close();
    },
  };
}
