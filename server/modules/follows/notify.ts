// Queues the "new revision" e-mail for a pattern's followers, inside the saving transaction
// (so a rolled-back save mails nobody); the outbox sends after commit.
import type { Knex } from 'knex';
import type { LibraryDeps } from '../library-deps.ts';
import { revisionSavedMail } from '../mail/messages.ts';

export async function queueRevisionMail(
  trx: Knex,
  deps: LibraryDeps,
  p: { shopId: number; patternId: number; patternName: string; number: number; authorId: number; authorName: string; note: string },
): Promise<number> {
  const followers = await deps.repos.follows.toNotify(trx, p.patternId, p.shopId, p.authorId);
  const origin = deps.config.publicOrigin;
  for (const f of followers) {
    const mail = revisionSavedMail({
      patternName: p.patternName,
      number: p.number,
      authorName: p.authorName,
      note: p.note,
      link: `${origin}/patterns/${p.patternId}/revisions/${p.number}`,
      settingsLink: `${origin}/settings`,
    });
    await deps.outbox.enqueue(trx, { shopId: p.shopId, kind: 'revision-saved', to: f.email, ...mail });
  }
  return followers.length;
}
