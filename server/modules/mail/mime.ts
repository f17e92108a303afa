// Reading a received message for the fake mailbox, with mailparser (the nodemailer family's
// parser): headers, encoded words, multipart bodies and transfer encodings are its job.
import type { Readable } from 'node:stream';
import { simpleParser, type AddressObject } from 'mailparser';

export interface ParsedMail {
  subject: string;
  from: string;
  to: string;
  text: string;
  html: string;
}

/** `Name <address>` per mailbox, as a person writes it (mailparser's `text` quotes names). */
function addresses(field: AddressObject | AddressObject[] | undefined): string {
  const list = (Array.isArray(field) ? field : field ? [field] : []).flatMap((a) => a.value);
  return list.map((a) => (a.name ? `${a.name} <${a.address ?? ''}>` : (a.address ?? ''))).join(', ');
}

/** Subject, addresses and the text and HTML bodies of a raw RFC 5322 message. */
export async function parseMail(raw: Buffer | string | Readable): Promise<ParsedMail> {
  // Only the parts the mailbox shows: no text-to-HTML conversion, no link rewriting.
  const m = await simpleParser(raw, { skipTextToHtml: true, skipTextLinks: true, skipImageLinks: true });
  return {
    subject: m.subject ?? '',
    from: addresses(m.from),
    to: addresses(m.to),
    // Readers of the mailbox want plain newlines and no trailing blank lines.
    text: (m.text ?? '').replace(/\r\n/g, '\n').trimEnd(),
    html: (typeof m.html === 'string' ? m.html : '').replace(/\r\n/g, '\n').trimEnd(),
  };
}
