// Share links: members with edit rights create and revoke them; anyone with the token sees
// one revision read-only, and nothing else of the shop.
import type { CreatedShare, ShareView } from '@shared/schemas/library-views.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { badInput, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { plausibleToken, newToken, tokenHash } from '../invites/tokens.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { idParam, patternOr404 } from '../patterns/pattern-access.ts';
import { iso } from '../patterns/views.ts';
import type { RevisionRow } from '../revisions/revisions.repository.ts';
import type { ResolvedShare, ShareRepository, ShareRow } from './share.repository.ts';

const shareView = (s: ShareRow): ShareView => ({ id: s.id, revision: s.revision_number, createdAt: iso(s.created_at), createdBy: s.creator_name });

export function createShareService(deps: LibraryDeps, shares: ShareRepository) {
  const { db, repos, config } = deps;
  const urlOf = (token: string) => `${config.publicOrigin}/s/${token}`;

  return {
    async create(auth: AuthContext, patternRaw: string | undefined, input: { revision?: number | null }): Promise<{ share: CreatedShare }> {
      const p = await patternOr404(repos.patterns, patternRaw, auth.shop.id);
      const revision = input.revision ?? null;
      if (revision !== null && (revision < 1 || revision > p.head_number)) throw badInput({ revision: `revision must be between 1 and ${p.head_number}, or left out for the head` });
      const token = newToken();
      const now = Date.now();
      const id = await writeTransaction(db, async (trx) => {
        const shareId = await shares.insert(trx, { pattern_id: p.id, revision_number: revision, token_hash: tokenHash(token), created_by: auth.user.id, created_at: now });
        await repos.audit.record(trx, { shopId: auth.shop.id, patternId: p.id, userId: auth.user.id, action: 'share.created', detail: { shareId, revision } });
        return shareId;
      });
      // The token is shown once, here; only its hash is stored.
      return { share: { id, revision, createdAt: iso(now), createdBy: auth.user.name, token, url: urlOf(token) } };
    },

    async list(auth: AuthContext, patternRaw: string | undefined) {
      const p = await patternOr404(repos.patterns, patternRaw, auth.shop.id);
      return { items: (await shares.forPattern(p.id)).map(shareView) };
    },

    async revoke(auth: AuthContext, raw: string | undefined): Promise<void> {
      const id = idParam(raw);
      await writeTransaction(db, async (trx) => {
        const link = id === null ? undefined : await shares.inShop(trx, id, auth.shop.id);
        if (!link) throw notFound('share link');
        await shares.revoke(trx, link.id, Date.now());
        await repos.audit.record(trx, { shopId: auth.shop.id, patternId: link.pattern_id, userId: auth.user.id, action: 'share.revoked', detail: { shareId: link.id } });
      });
    },

    /** The link's pattern and revision (the head when the link names none), or 404. */
    async resolve(token: string | undefined): Promise<{ share: ResolvedShare; revision: RevisionRow }> {
      const share = plausibleToken(token) ? await shares.resolve(tokenHash(token)) : undefined;
      if (!share) throw notFound('share link');
      const revision = await repos.revisions.byNumber(share.pattern_id, share.revision_number ?? share.head_number);
      if (!revision) throw notFound('share link');
      return { share, revision };
    },
  };
}
export type ShareService = ReturnType<typeof createShareService>;
