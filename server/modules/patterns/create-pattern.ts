// Writes a new pattern with its first revisions inside the caller's transaction. Used by
// create, duplicate and import so all three leave the same rows behind.
import type { Knex } from 'knex';
import { ENGINE_VERSION } from '@shared/pattern/engine-version.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import type { AuditAction } from '../audit/audit.repository.ts';
import type { LibraryDeps } from '../library-deps.ts';

export interface NewPattern {
  shopId: number;
  userId: number;
  name: string;
  kind: string;
  tags: string[];
  archived?: boolean;
  /** Revisions 1..n in order (at least one). */
  revisions: Array<{ spec: StrapSpec; note: string; engineVersion?: string; createdAt?: number; restoredFrom?: number | null }>;
  audit: { action: AuditAction; detail?: Record<string, unknown> };
}

/** Inserts the pattern, its revisions, the creator's follow and the audit row; returns the id. */
export async function insertPattern(trx: Knex, deps: LibraryDeps, p: NewPattern): Promise<number> {
  const now = Date.now();
  const id = await deps.repos.patterns.insert(trx, {
    shop_id: p.shopId,
    name: p.name,
    kind: p.kind,
    tags: JSON.stringify(p.tags),
    archived: p.archived ?? false,
    head_number: p.revisions.length,
    created_by: p.userId,
    created_at: now,
    updated_at: now,
  });
  for (const [i, r] of p.revisions.entries()) {
    await deps.repos.revisions.insert(trx, {
      pattern_id: id,
      number: i + 1,
      spec: JSON.stringify(r.spec),
      engine_version: r.engineVersion ?? ENGINE_VERSION,
      author_id: p.userId,
      note: r.note,
      restored_from: r.restoredFrom ?? null,
      created_at: r.createdAt ?? now,
    });
  }
  await deps.repos.follows.follow(trx, id, p.userId);
  await deps.repos.audit.record(trx, { shopId: p.shopId, patternId: id, userId: p.userId, action: p.audit.action, detail: p.audit.detail ?? {} });
  return id;
}
