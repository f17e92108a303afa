// A local SMTP server for development and tests: accepts every message on 127.0.0.1 and
// keeps it (in memory, and as JSON files when given a folder so a dev restart keeps them).
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { parseMail, type ParsedMail } from './mime.ts';

/** One received message. */
export interface ReceivedMail extends ParsedMail {
  id: number;
  receivedAt: string;
  /** Envelope recipients. */
  recipients: string[];
}

/** What the fake server received, newest last. */
export interface Mailbox {
  messages(): ReceivedMail[];
  /** Resolves with the first message matching `test`, waiting up to `timeoutMs` (a guard
   * against hangs, generous so a loaded machine never trips it). */
  waitFor(test: (m: ReceivedMail) => boolean, timeoutMs?: number): Promise<ReceivedMail>;
}

export interface FakeSmtp {
  port: number;
  mailbox: Mailbox;
  close(): Promise<void>;
}

/** Starts the fake server on 127.0.0.1:`port` (0 = any free port). */
export async function startFakeSmtp(options: { port?: number; folder?: string } = {}): Promise<FakeSmtp> {
  const stored: ReceivedMail[] = [];
  const waiters = new Set<() => void>();
  let parsing: Promise<void> = Promise.resolve();
  if (options.folder) {
    mkdirSync(options.folder, { recursive: true });
    for (const f of readdirSync(options.folder).filter((n) => n.endsWith('.json')).sort()) {
      stored.push(JSON.parse(readFileSync(join(options.folder, f), 'utf8')) as ReceivedMail);
    }
  }
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Latchet development mailbox',
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const recipients = session.envelope.rcptTo.map((r) => r.address);
        const receivedAt = new Date().toISOString();
        // Parsing is asynchronous: chain it so messages keep their arrival order and ids.
        const parsed = parsing.then(async () => {
          const mail: ReceivedMail = { id: (stored.at(-1)?.id ?? 0) + 1, receivedAt, recipients, ...(await parseMail(Buffer.concat(chunks))) };
          stored.push(mail);
          if (options.folder) writeFileSync(join(options.folder, `${String(mail.id).padStart(6, '0')}.json`), JSON.stringify(mail, null, 2));
          for (const w of waiters) w();
        });
        parsing = parsed.catch(() => undefined);
        parsed.then(
          () => callback(),
          (err: Error) => callback(err),
        );
      });
    },
  });
  server.on('error', (err) => console.error('fake SMTP:', err.message));
  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;

  const mailbox: Mailbox = {
    messages: () => [...stored],
    waitFor(test, timeoutMs = 30_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          const found = stored.find(test);
          if (!found) return false;
          waiters.delete(check);
          clearTimeout(timer);
          resolve(found);
          return true;
        };
        const timer = setTimeout(() => {
          waiters.delete(check);
          reject(new Error(`no matching mail within ${timeoutMs} ms (${stored.length} received)`));
        }, timeoutMs);
        if (!check()) waiters.add(check);
      });
    },
  };
  return { port, mailbox, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
