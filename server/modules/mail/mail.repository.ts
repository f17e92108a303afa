// The outgoing mail record (an outbox): rows are written in the same transaction as the
// change that causes them and sent after it commits.
import type { Knex } from 'knex';

export interface OutgoingMail {
  shopId: number | null;
  kind: 'invite' | 'revision-saved' | 'measure-request' | 'measure-answered' | 'proof-answered';
  to: string;
  subject: string;
  text: string;
  html: string;
}
export interface OutgoingRow {
  id: number;
  shop_id: number | null;
  kind: string;
  to_email: string;
  subject: string;
  text_body: string;
  html_body: string;
  status: 'queued' | 'sent' | 'failed';
  attempts: number;
}

export function createMailRepository(db: Knex) {
  return {
    async enqueue(q: Knex, mail: OutgoingMail, now: number): Promise<number> {
      const [row] = await q('outgoing_mail')
        .insert({ shop_id: mail.shopId, kind: mail.kind, to_email: mail.to, subject: mail.subject, text_body: mail.text, html_body: mail.html, status: 'queued', created_at: now })
        .returning<{ id: number }[]>('id');
      return row!.id;
    },
    queued: (limit: number) => db<OutgoingRow>('outgoing_mail').where({ status: 'queued' }).orderBy('id').limit(limit),
    markSent: (id: number, now: number) => db('outgoing_mail').where({ id }).update({ status: 'sent', sent_at: now, attempts: db.raw('attempts + 1') }),
    markFailed: (id: number, error: string, giveUp: boolean) =>
      db('outgoing_mail')
        .where({ id })
        .update({ status: giveUp ? 'failed' : 'queued', last_error: error.slice(0, 500), attempts: db.raw('attempts + 1') }),
    byId: (id: number) => db<OutgoingRow>('outgoing_mail').where({ id }).first(),
  };
}
export type MailRepository = ReturnType<typeof createMailRepository>;
