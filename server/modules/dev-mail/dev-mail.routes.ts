// The development mailbox: every message the fake SMTP server received, for a signed-in
// owner, as JSON (/api/dev/mail) and as a plain page with clickable links (/dev/mail).
// createApp mounts neither in production.
import { Router, type RequestHandler } from 'express';
import { route } from '../../http/allow.ts';
import { requireRole } from '../../http/require-role.ts';
import type { Mailbox, ReceivedMail } from '../mail/fake-smtp.ts';
import escapeHtml from 'escape-html';

const linkify = (text: string) => escapeHtml(text).replace(/https?:\/\/[^\s<]+/g, (url) => `<a href="${url}">${url}</a>`);

function page(messages: ReceivedMail[]): string {
  const items = messages
    .slice()
    .reverse()
    .map(
      (m) => `<article>
  <h2>${escapeHtml(m.subject)}</h2>
  <p class="meta">to ${escapeHtml(m.recipients.join(', '))} · from ${escapeHtml(m.from)} · ${escapeHtml(m.receivedAt)}</p>
  <pre>${linkify(m.text)}</pre>
</article>`,
    )
    .join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Latchet dev mailbox</title>
<style>body{font-family:system-ui,sans-serif;margin:2rem auto;max-width:760px;color:#2b2118;background:#faf6f0}
article{background:#fff;border:1px solid #e3d8c8;border-radius:6px;padding:1rem 1.25rem;margin:0 0 1rem}
h1{font-size:1.4rem}h2{font-size:1.05rem;margin:0 0 .25rem}.meta{color:#6b5a4a;font-size:.85rem;margin:0 0 .75rem}
pre{white-space:pre-wrap;font-family:inherit;margin:0}a{color:#7a4a24}</style></head>
<body><h1>Development mailbox</h1><p>${messages.length} message(s) received by the local SMTP server, newest first. Not present in production.</p>
${items || '<p>No mail yet.</p>'}</body></html>`;
}

/** JSON under /api (mounted on the API router). */
export function devMailApiRoutes(mailbox: Mailbox): Router {
  const r = Router();
  route(r, 'devmail.read', (_req, res) => {
    res.json({ messages: mailbox.messages().slice().reverse() });
  });
  return r;
}

/** The HTML page at /dev/mail; `session` is the API's session middleware. */
export function devMailPage(mailbox: Mailbox, session: RequestHandler): Router {
  const r = Router();
  r.get('/dev/mail', session, (req, res, next) => {
    if (!req.auth) return res.redirect(302, `/sign-in?redirectTo=${encodeURIComponent('/dev/mail')}`);
    next();
  }, requireRole('owner'), (_req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.type('html').send(page(mailbox.messages()));
  });
  return r;
}
