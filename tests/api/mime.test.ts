// The fake mailbox reads what nodemailer writes: quoted-printable and base64 bodies,
// RFC 2047 encoded-word subjects, multipart/alternative (nodemailer is the outside source).
import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { parseMail } from '../../server/modules/mail/mime.ts';

async function raw(options: { textEncoding?: 'base64' | 'quoted-printable' }): Promise<string> {
  const t = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
  const info = await t.sendMail({
    from: 'Latchet <no-reply@latchet.example>',
    to: 'ilse@harrowfinch.example',
    subject: 'Juniper’s collar: revision 3 — ½ in longer',
    text: `Maren saved revision 3.\n${'A long line about the tip, the English point and the keeper. '.repeat(3)}\nhttp://localhost:3000/patterns/1/revisions/3?x=1&y=2`,
    html: '<p>Maren saved <b>revision 3</b> – ½ in</p>',
    ...options,
  });
  return (info.message as Buffer).toString('utf8');
}

describe('parseMail', () => {
  for (const textEncoding of ['quoted-printable', 'base64'] as const) {
    it(`when nodemailer writes ${textEncoding} bodies, then text, html and the subject read back exactly`, async () => {
      const m = parseMail(await raw({ textEncoding }));
      expect(m.subject).toBe('Juniper’s collar: revision 3 — ½ in longer');
      expect(m.to).toBe('ilse@harrowfinch.example');
      expect(m.text).toContain('http://localhost:3000/patterns/1/revisions/3?x=1&y=2');
      expect(m.text.split('\n')[1]).toBe('A long line about the tip, the English point and the keeper. '.repeat(3));
      expect(m.html).toBe('<p>Maren saved <b>revision 3</b> – ½ in</p>');
    });
  }
});
