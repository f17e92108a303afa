// The mail outbox: queued in the transaction, sent after it, retried, then given up.
import nodemailer from 'nodemailer';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { writeTransaction } from '../../server/db/write-transaction.ts';
import { MAX_ATTEMPTS, RETRY_AFTER_MS, createOutbox, type OutboxTimers } from '../../server/modules/mail/outbox.ts';
import { startFakeSmtp, type FakeSmtp } from '../../server/modules/mail/fake-smtp.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';

let t: TestApp;
let smtp: FakeSmtp;
beforeEach(async () => {
  t = await createTestApp();
  smtp = await startFakeSmtp();
});
afterEach(async () => {
  await smtp.close();
  await t.close();
});

const mail = (to: string) => ({ shopId: null, kind: 'invite' as const, to, subject: 'Fitting on Thursday', text: 'Bring Bosun.', html: '<p>Bring Bosun.</p>' });

describe('outbox', () => {
  it('when the transaction that queued a mail rolls back, then the mail is never sent', async () => {
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: smtp.port, secure: false, ignoreTLS: true });
    const outbox = createOutbox(t.db, transport, 'Latchet <no-reply@latchet.example>', () => undefined);
    await expect(
      writeTransaction(t.db, async (trx) => {
        await outbox.enqueue(trx, mail('rolled@harrowfinch.example'));
        throw new Error('save refused');
      }),
    ).rejects.toThrow('save refused');
    await writeTransaction(t.db, (trx) => outbox.enqueue(trx, mail('kept@harrowfinch.example')));
    await outbox.flush();
    expect(smtp.mailbox.messages().map((m) => m.recipients[0])).toEqual(['kept@harrowfinch.example']);
    expect(smtp.mailbox.messages()[0]).toMatchObject({ subject: 'Fitting on Thursday', text: 'Bring Bosun.', html: '<p>Bring Bosun.</p>' });
  });

  it(`when the SMTP server refuses every time, then the mail is marked failed after ${MAX_ATTEMPTS} attempts`, async () => {
    const port = smtp.port;
    await smtp.close();
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true, connectionTimeout: 500 });
    const outbox = createOutbox(t.db, transport, 'Latchet <no-reply@latchet.example>', () => undefined);
    const id = await writeTransaction(t.db, (trx) => outbox.enqueue(trx, mail('nowhere@harrowfinch.example')));
    for (let i = 0; i < MAX_ATTEMPTS; i += 1) await outbox.flush();
    expect(await outbox.statusOf(id)).toBe('failed');
    const row = await t.db('outgoing_mail').where({ id }).first();
    expect(row.attempts).toBe(MAX_ATTEMPTS);
    expect(row.last_error).toBeTruthy();
    smtp = await startFakeSmtp();
  });

  it('when a whole batch fails, then a retry is scheduled 30 s later, and when it runs with the server back the mail goes out', async () => {
    const port = smtp.port;
    await smtp.close();
    // Injected timers: the retry is run by the test, not by waiting 30 s.
    const scheduled: { run: () => void; ms: number }[] = [];
    const timers: OutboxTimers = { schedule: (run, ms) => (scheduled.push({ run, ms }), () => undefined), now: () => Date.UTC(2026, 11, 3, 9) };
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    const outbox = createOutbox(t.db, transport, 'Latchet <no-reply@latchet.example>', () => undefined, timers);
    const id = await writeTransaction(t.db, (trx) => outbox.enqueue(trx, mail('later@harrowfinch.example')));
    await outbox.flush();
    expect(await outbox.statusOf(id)).toBe('queued');
    expect(scheduled.map((s) => s.ms)).toEqual([RETRY_AFTER_MS]);
    expect(RETRY_AFTER_MS).toBe(30_000);

    smtp = await startFakeSmtp({ port });
    scheduled[0]!.run();
    await outbox.flush();
    expect(await outbox.statusOf(id)).toBe('sent');
    expect(Number((await t.db('outgoing_mail').where({ id }).first()).sent_at)).toBe(Date.UTC(2026, 11, 3, 9));
    expect(smtp.mailbox.messages().map((m) => m.recipients[0])).toEqual(['later@harrowfinch.example']);
  });
});
