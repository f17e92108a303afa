// The wording of our e-mails: plain text first, and a simple HTML twin with the same words.
import type { Role } from '@shared/schemas/auth.ts';
import { mailHtml } from './mail-html.ts';

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (everything, including members and invites)',
  maker: 'a maker (draft and save patterns, share them)',
  apprentice: 'an apprentice (read the library and print templates)',
};


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
    html: mailHtml(lines, { href: p.link, label: `Join ${p.shopName}` }, footer),
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
    html: mailHtml(lines, { href: p.link, label: `Open revision ${p.number}` }, footer),
  };
}
