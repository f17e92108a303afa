// The wording of our e-mails: plain text first, and a simple HTML twin with the same words.
import type { Role } from '@shared/schemas/auth.ts';

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (everything, including members and invites)',
  maker: 'a maker (draft and save patterns, share them)',
  apprentice: 'an apprentice (read the library and print templates)',
};

function html(paragraphs: string[], link: { href: string; label: string }, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p).replace(/\n/g, '<br>')}</p>`).join('\n');
  return `<!doctype html><html><body style="font-family:'IBM Plex Sans',Arial,sans-serif;color:#2b2118;line-height:1.5;max-width:560px">
${body}
<p style="margin:18px 0"><a href="${escapeHtml(link.href)}" style="background:#7a4a24;color:#fff;padding:8px 14px;border-radius:4px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="margin:0;font-size:13px;color:#6b5a4a">${escapeHtml(footer)}</p>
</body></html>`;
}

/** The e-mail that carries an invite link. */
export function inviteMail(p: { shopName: string; inviterName: string; role: Role; link: string; expiresAt: Date }) {
  const until = p.expiresAt.toUTCString().replace(/:\d\d GMT$/, ' UTC');
  const subject = `${p.inviterName} asks you to join ${p.shopName} on Latchet`;
  const lines = [
    `${p.inviterName} has opened a place for you in ${p.shopName}'s pattern library, as ${ROLE_WORDS[p.role]}.`,
    `Open the link below to take it. It works once and runs out on ${until}.`,
  ];
  const footer = 'If you did not expect this, ignore it: nothing happens until the link is opened and accepted.';
  return {
    subject,
    text: `${lines.join('\n\n')}\n\n${p.link}\n\n${footer}\n`,
    html: html(lines, { href: p.link, label: `Join ${p.shopName}` }, footer),
  };
}

/** The e-mail a follower gets when someone saves a new revision of a pattern. */
export function revisionSavedMail(p: { patternName: string; number: number; authorName: string; note: string; link: string; settingsLink: string }) {
  const subject = `${p.patternName}: revision ${p.number} saved by ${p.authorName}`;
  const lines = [
    `${p.authorName} saved revision ${p.number} of "${p.patternName}".`,
    p.note ? `Their note:\n${p.note}` : 'They left no note.',
  ];
  const footer = `You get this because you follow this pattern. Turn these e-mails off under your settings: ${p.settingsLink}`;
  return {
    subject,
    text: `${lines.join('\n\n')}\n\nSee it: ${p.link}\n\n${footer}\n`,
    html: html(lines, { href: p.link, label: `Open revision ${p.number}` }, footer),
  };
}
