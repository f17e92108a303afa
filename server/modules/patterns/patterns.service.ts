// The library: list, create, read, rename/tag/archive, duplicate, follow, activity.
import type { ListPatternsQuery, PatternPage, PatternView, PatternWithHead } from '@shared/schemas/library.ts';
import type { ActivityItem } from '@shared/schemas/library-views.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { headFit } from '@shared/schemas/head-fit.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { badInput } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { layoutOrBadInput } from '../engine/engine-port.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { revisionEtag } from '../revisions/etag.ts';
import { insertPattern } from './create-pattern.ts';
import { idParam, patternOr404 } from './pattern-access.ts';
import type { PageCursor } from './patterns.repository.ts';
import { iso, patternView, revisionView } from './views.ts';

const encodeCursor = (c: PageCursor) => Buffer.from(JSON.stringify([c.key, c.id])).toString('base64url');
function decodeCursor(raw: string | undefined): PageCursor | null {
  if (raw === undefined || raw === '') return null;
  try {
    const [key, id] = JSON.parse(Buffer.from(raw, 'base64url').toString('utf8')) as [unknown, unknown];
    if ((typeof key === 'string' || typeof key === 'number') && typeof id === 'number') return { key, id };
  } catch {
    // fall through to the 400
  }
  throw badInput({ cursor: 'cursor is not one this server handed out; start from the first page' });
}

export function createPatternsService(deps: LibraryDeps) {
  const { db, repos } = deps;

  async function withHead(auth: AuthContext, id: number): Promise<PatternWithHead & { etag: string }> {
    const p = await patternOr404(repos.patterns, String(id), auth.shop.id);
    const head = await repos.revisions.byNumber(p.id, p.head_number);
    const following = await repos.follows.isFollowing(p.id, auth.user.id);
    return { pattern: patternView(p, following), head: revisionView(head!), etag: revisionEtag(p.id, p.head_number) };
  }

  return {
    async list(auth: AuthContext, q: ListPatternsQuery): Promise<PatternPage> {
      const rows = await repos.patterns.list(auth.shop.id, auth.user.id, q, decodeCursor(q.cursor));
      const page = rows.slice(0, q.limit);
      const last = page.at(-1);
      return {
        items: page.map((r) => ({
          ...patternView(r, Boolean(r.following)),
          head: {
            number: r.head_number,
            engineVersion: r.head_engine_version,
            note: r.head_note,
            createdAt: iso(r.head_created_at),
            author: r.head_author_id !== null ? { id: r.head_author_id, name: r.head_author_name ?? '' } : null,
            restoredFrom: r.head_restored_from,
            fit: headFit(JSON.parse(r.head_spec) as StrapSpec),
          },
        })),
        nextCursor: rows.length > q.limit && last ? encodeCursor({ key: q.sort === 'name' ? last.name : Number(last.updated_at), id: last.id }) : null,
      };
    },

    async create(auth: AuthContext, input: { name: string; kind: string; spec: StrapSpec; note: string; tags: string[] }) {
      if (input.spec.kind !== input.kind) throw badInput({ kind: `Kind of strap must be ${input.spec.kind}, the kind in the pattern's measurements` });
      layoutOrBadInput(input.spec);
      const id = await writeTransaction(db, (trx) =>
        insertPattern(trx, deps, {
          shopId: auth.shop.id,
          userId: auth.user.id,
          name: input.name,
          kind: input.kind,
          tags: input.tags,
          revisions: [{ spec: input.spec, note: input.note }],
          audit: { action: 'pattern.created' },
        }),
      );
      return withHead(auth, id);
    },

    get: (auth: AuthContext, raw: string | undefined) => withHead(auth, idParam(raw) ?? 0),

    async update(auth: AuthContext, raw: string | undefined, input: { name?: string; tags?: string[]; archived?: boolean }): Promise<PatternView> {
      const p = await patternOr404(repos.patterns, raw, auth.shop.id);
      await writeTransaction(db, async (trx) => {
        await repos.patterns.update(trx, p.id, {
          ...(input.name !== undefined ? { name: input.name } : {}),
          ...(input.tags !== undefined ? { tags: JSON.stringify(input.tags) } : {}),
          ...(input.archived !== undefined ? { archived: input.archived } : {}),
          updated_at: Date.now(),
        });
        await repos.audit.record(trx, { shopId: auth.shop.id, patternId: p.id, userId: auth.user.id, action: 'pattern.updated', detail: input });
      });
      return (await withHead(auth, p.id)).pattern;
    },

    async duplicate(auth: AuthContext, raw: string | undefined, input: { revision?: number; name?: string }) {
      const p = await patternOr404(repos.patterns, raw, auth.shop.id);
      const n = input.revision ?? p.head_number;
      const source = await repos.revisions.byNumber(p.id, n);
      if (!source) throw badInput({ revision: `revision must be between 1 and ${p.head_number}` });
      const id = await writeTransaction(db, (trx) =>
        insertPattern(trx, deps, {
          shopId: auth.shop.id,
          userId: auth.user.id,
          name: input.name ?? `${p.name} (copy)`.slice(0, 120),
          kind: p.kind,
          tags: JSON.parse(p.tags) as string[],
          revisions: [{ spec: JSON.parse(source.spec) as StrapSpec, note: `Duplicated from "${p.name}" revision ${n}` }],
          audit: { action: 'pattern.duplicated', detail: { fromPatternId: p.id, fromRevision: n } },
        }),
      );
      return withHead(auth, id);
    },

    async follow(auth: AuthContext, raw: string | undefined, on: boolean): Promise<{ following: boolean }> {
      const p = await patternOr404(repos.patterns, raw, auth.shop.id);
      if (on) await repos.follows.follow(db, p.id, auth.user.id);
      else await repos.follows.unfollow(p.id, auth.user.id);
      return { following: on };
    },

    async activity(auth: AuthContext, raw: string | undefined): Promise<{ items: ActivityItem[] }> {
      const p = await patternOr404(repos.patterns, raw, auth.shop.id);
      const rows = await repos.audit.forPattern(p.id, 200);
      return {
        items: rows.map((r) => ({
          id: r.id,
          action: r.action,
          detail: JSON.parse(r.detail) as Record<string, unknown>,
          at: iso(r.created_at),
          by: r.user_id !== null ? { id: r.user_id, name: r.user_name ?? '' } : null,
        })),
      };
    },
  };
}
export type PatternsService = ReturnType<typeof createPatternsService>;
