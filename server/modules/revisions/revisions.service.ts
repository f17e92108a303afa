// Revisions: history, one revision, and new heads by compare-and-set (save, restore).
import type { Knex } from 'knex';
import { ENGINE_VERSION } from '@shared/pattern/engine-version.ts';
import type { RevisionView } from '@shared/schemas/library.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError, badInput, notFound } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { layoutOrBadInput } from '../engine/engine-port.ts';
import { queueRevisionMail } from '../follows/notify.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { idParam, patternOr404 } from '../patterns/pattern-access.ts';
import type { PatternRow } from '../patterns/patterns.repository.ts';
import { revisionView } from '../patterns/views.ts';
import { requireIfMatch, revisionEtag } from './etag.ts';

export interface NewHead {
  revision: RevisionView;
  etag: string;
}

export function createRevisionsService(deps: LibraryDeps) {
  const { db, repos } = deps;

  async function revisionOr404(patternId: number, raw: string | undefined, q: Knex = db) {
    const n = idParam(raw);
    const row = n === null ? undefined : await repos.revisions.byNumber(patternId, n, q);
    if (!row) throw notFound('revision');
    return row;
  }

  /** 412 with the current head in the body and its ETag in the header (RFC 9110, 13.1.1). */
  async function stale(pattern: PatternRow): Promise<never> {
    const head = await repos.revisions.byNumber(pattern.id, pattern.head_number);
    throw new HttpError(
      412,
      'stale_revision',
      `Revision ${pattern.head_number} was saved after the one you started from; look at it, then save again on top of it.`,
      undefined,
      { head: head ? revisionView(head) : null },
      { ETag: revisionEtag(pattern.id, pattern.head_number) },
    );
  }

  /**
   * Appends revision head+1 when the head is still one of `expectedTags` (null = no check),
   * all in one IMMEDIATE transaction: the check, the insert, the head move, the audit row,
   * the author's follow and the followers' mail.
   */
  async function append(auth: AuthContext, patternRaw: string | undefined, expectedTags: string[] | null, build: (trx: Knex, p: PatternRow) => Promise<{ spec: StrapSpec; note: string; restoredFrom: number | null }>): Promise<NewHead> {
    const result = await writeTransaction(db, async (trx): Promise<{ kind: 'stale'; pattern: PatternRow } | { kind: 'saved'; head: NewHead }> => {
      const p = await patternOr404(repos.patterns, patternRaw, auth.shop.id, trx);
      if (expectedTags && !expectedTags.includes(revisionEtag(p.id, p.head_number))) return { kind: 'stale', pattern: p };
      const { spec, note, restoredFrom } = await build(trx, p);
      const now = Date.now();
      const number = p.head_number + 1;
      await repos.revisions.insert(trx, {
        pattern_id: p.id,
        number,
        spec: JSON.stringify(spec),
        engine_version: ENGINE_VERSION,
        author_id: auth.user.id,
        note,
        restored_from: restoredFrom,
        created_at: now,
      });
      const moved = await repos.patterns.moveHead(trx, p.id, p.head_number, number, now);
      if (moved !== 1) throw new Error('head moved inside an immediate transaction');
      await repos.audit.record(trx, {
        shopId: auth.shop.id,
        patternId: p.id,
        userId: auth.user.id,
        action: restoredFrom === null ? 'revision.saved' : 'revision.restored',
        detail: { number, ...(restoredFrom !== null ? { restoredFrom } : {}) },
      });
      await repos.follows.follow(trx, p.id, auth.user.id);
      await queueRevisionMail(trx, deps, { shopId: auth.shop.id, patternId: p.id, patternName: p.name, number, authorId: auth.user.id, authorName: auth.user.name, note });
      const row = await repos.revisions.byNumber(p.id, number, trx);
      return { kind: 'saved', head: { revision: revisionView(row!), etag: revisionEtag(p.id, number) } };
    });
    if (result.kind === 'stale') return stale(result.pattern);
    deps.outbox.kick();
    return result.head;
  }

  return {
    async list(auth: AuthContext, patternRaw: string | undefined): Promise<RevisionView[]> {
      const p = await patternOr404(repos.patterns, patternRaw, auth.shop.id);
      return (await repos.revisions.list(p.id)).map(revisionView);
    },

    async get(auth: AuthContext, patternRaw: string | undefined, nRaw: string | undefined): Promise<NewHead> {
      const p = await patternOr404(repos.patterns, patternRaw, auth.shop.id);
      const row = await revisionOr404(p.id, nRaw);
      return { revision: revisionView(row), etag: revisionEtag(p.id, row.number) };
    },

    /** `POST /revisions`: the spec is checked by the engine before any lock is taken. */
    save(auth: AuthContext, patternRaw: string | undefined, ifMatch: string | undefined, input: { spec: StrapSpec; note: string }): Promise<NewHead> {
      const tags = requireIfMatch(ifMatch);
      layoutOrBadInput(input.spec);
      return append(auth, patternRaw, tags, async (_trx, p) => {
        if (input.spec.kind !== p.kind) throw badInput({ 'spec.kind': `Kind of strap must stay ${p.kind} (duplicate the pattern to change its kind)` });
        return { spec: input.spec, note: input.note, restoredFrom: null };
      });
    },

    /** `POST /revisions/:n/restore`: a new head equal to revision n; If-Match optional. */
    restore(auth: AuthContext, patternRaw: string | undefined, nRaw: string | undefined, ifMatch: string | undefined): Promise<NewHead> {
      const tags = ifMatch === undefined ? null : requireIfMatch(ifMatch);
      return append(auth, patternRaw, tags, async (trx, p) => {
        const old = await revisionOr404(p.id, nRaw, trx);
        return { spec: JSON.parse(old.spec) as StrapSpec, note: `Restored from revision ${old.number}`, restoredFrom: old.number };
      });
    },

    revisionOr404,
  };
}
export type RevisionsService = ReturnType<typeof createRevisionsService>;
