// The fake mailbox reads what nodemailer writes through mailparser: quoted-printable and
// base64 bodies, RFC 2047 encoded-word subjects, multipart/alternative (nodemailer is the
// outside source of the raw message).
import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { parseMail } from '../../server/modules/mail/mime.ts';

async function raw(options: { textEncoding?: 'base64' | 'quoted-printable' }): Promise<Buffer> {
  const t = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
  const info = await t.sendMail({
    from: 'Latchet <no-reply@latchet.example>',
    to: 'ilse@harrowfinch.example',
    subject: 'Juniper’s collar: revision 3 — ½ in longer',
    text: `Maren saved revision 3.\n${'A long line about the tip, the English point and the keeper. '.repeat(3)}\nhttp://localhost:3000/patterns/1/revisions/3?x=1&y=2`,
    html: '<p>Maren saved <b>revision 3</b> – ½ in</p>',
    ...options,
  });
  return info.message as Buffer;
}

describe('parseMail', () => {
  for (const textEncoding of ['quoted-printable', 'base64'] as const) {
    it(`when nodemailer writes ${textEncoding} bodies, then text, html, the subject and the addresses read back exactly`, async () => {
      const message = await raw({ textEncoding });
      // The raw message really is encoded that way (so the decoding is what is tested).
      expect(message.toString('utf8')).toMatch(new RegExp(`Content-Transfer-Encoding: ${textEncoding}`, 'i'));
      const m = await parseMail(message);
      expect(m.subject).toBe('Juniper’s collar: revision 3 — ½ in longer');
      expect(m.from).toBe('Latchet <no-reply@latchet.example>');
      expect(m.to).toBe('ilse@harrowfinch.example');
      expect(m.text).toContain('http://localhost:3000/patterns/1/revisions/3?x=1&y=2');
      expect(m.text.split('\n')[1]).toBe('A long line about the tip, the English point and the keeper. '.repeat(3));
      expect(m.html).toBe('<p>Maren saved <b>revision 3</b> – ½ in</p>');
    });
  }

  it('when a message has only a text body, then html is empty and the text keeps its lines', async () => {
    const t = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
    const info = await t.sendMail({ from: 'no-reply@latchet.example', to: ['a@harrowfinch.example', 'b@harrowfinch.example'], subject: 'Plain', text: 'one\ntwo\n\n' });
    const m = await parseMail(info.message as Buffer);
    expect(m).toMatchObject({ subject: 'Plain', from: 'no-reply@latchet.example', to: 'a@harrowfinch.example, b@harrowfinch.example', text: 'one\ntwo', html: '' });
  });
});
