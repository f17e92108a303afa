// Just enough MIME reading for the fake mailbox: headers, multipart/alternative parts,
// quoted-printable and base64 bodies (what nodemailer writes). Not a general parser.

export interface ParsedMail {
  subject: string;
  from: string;
  to: string;
  text: string;
  html: string;
}

function splitHead(raw: string): { headers: Map<string, string>; body: string } {
  const at = raw.search(/\r?\n\r?\n/);
  const head = at < 0 ? raw : raw.slice(0, at);
  const body = at < 0 ? '' : raw.slice(at).replace(/^\r?\n\r?\n/, '');
  const headers = new Map<string, string>();
  // Folded header lines continue with whitespace (RFC 5322, 2.2.3).
  for (const line of head.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeQuotedPrintable(s: string): string {
  const bytes: number[] = [];
  const text = s.replace(/=\r?\n/g, '');
  for (let i = 0; i < text.length; i += 1) {
    const c = text[i]!;
    if (c === '=' && /^[0-9A-F]{2}$/i.test(text.slice(i + 1, i + 3))) {
      bytes.push(parseInt(text.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(...Buffer.from(c, 'utf8'));
  }
  return Buffer.from(bytes).toString('utf8');
}

function decodeBody(body: string, encoding: string | undefined): string {
  const enc = (encoding ?? '7bit').toLowerCase();
  if (enc === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (enc === 'quoted-printable') return decodeQuotedPrintable(body);
  return body;
}

/** RFC 2047 encoded words such as =?UTF-8?Q?...?= in a header. */
function decodeHeader(value: string): string {
  // Whitespace between two encoded words is not part of the text (RFC 2047, 6.2).
  return value.replace(/\?=\s+=\?/g, '?==?').replace(/=\?([^?]+)\?([BQbq])\?([^?]*)\?=/g, (_m, _charset: string, kind: string, data: string) =>
    kind.toUpperCase() === 'B' ? Buffer.from(data, 'base64').toString('utf8') : decodeQuotedPrintable(data.replace(/_/g, ' ')),
  );
}

function collect(raw: string, out: { text: string; html: string }): void {
  const { headers, body } = splitHead(raw);
  const type = headers.get('content-type') ?? 'text/plain';
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (/^multipart\//i.test(type) && boundary) {
    for (const part of body.split(`--${boundary}`).slice(1)) {
      if (part.startsWith('--')) break;
      collect(part.replace(/^\r?\n/, ''), out);
    }
    return;
  }
  const decoded = decodeBody(body, headers.get('content-transfer-encoding'));
  if (/^text\/html/i.test(type)) out.html ||= decoded;
  else if (/^text\/plain/i.test(type)) out.text ||= decoded;
}

/** Subject, addresses and the text and HTML bodies of a raw RFC 5322 message. */
export function parseMail(raw: string): ParsedMail {
  const { headers } = splitHead(raw);
  const out = { text: '', html: '' };
  collect(raw, out);
  return {
    subject: decodeHeader(headers.get('subject') ?? ''),
    from: decodeHeader(headers.get('from') ?? ''),
    to: decodeHeader(headers.get('to') ?? ''),
    // SMTP lines end in CRLF (RFC 5321); readers of the mailbox want plain newlines.
    text: out.text.replace(/\r\n/g, '\n').trimEnd(),
    html: out.html.replace(/\r\n/g, '\n').trimEnd(),
  };
}
