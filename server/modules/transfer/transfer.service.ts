// Export to and import from the pattern file (shared/schemas/pattern-file.ts).
import { PATTERN_FILE_FORMAT, PATTERN_FILE_VERSION, PatternFileSchema, type PatternFile } from '@shared/schemas/pattern-file.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { badInput } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { layoutOrBadInput } from '../engine/engine-port.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { insertPattern } from '../patterns/create-pattern.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import { iso } from '../patterns/views.ts';
import { parseOr400 } from '../../http/zod-fields.ts';

export function createTransferService(deps: LibraryDeps) {
  const { db, repos } = deps;
  return {
    async exportFile(auth: AuthContext, raw: string | undefined): Promise<{ file: PatternFile; name: string }> {
      const p = await patternOr404(repos.patterns, raw, auth.shop.id);
      const revisions = await repos.revisions.all(p.id);
      await repos.audit.record(db, { shopId: auth.shop.id, patternId: p.id, userId: auth.user.id, action: 'pattern.exported', detail: { revisions: revisions.length } });
      const file: PatternFile = {
        format: PATTERN_FILE_FORMAT,
        formatVersion: PATTERN_FILE_VERSION,
        exportedAt: new Date().toISOString(),
        pattern: { name: p.name, kind: p.kind as PatternFile['pattern']['kind'], tags: JSON.parse(p.tags) as string[], archived: Boolean(p.archived) },
        revisions: revisions.map((r) => ({
          number: r.number,
          spec: JSON.parse(r.spec) as StrapSpec,
          engineVersion: r.engine_version,
          note: r.note,
          createdAt: iso(r.created_at),
          author: r.author_name,
          restoredFrom: r.restored_from,
        })),
      };
      return { file, name: p.name };
    },

    /** Validates everything first; writes the pattern and all revisions in one transaction or nothing. */
    async importFile(auth: AuthContext, text: string): Promise<number> {
      let json: unknown;
      try {
        json = JSON.parse(text);
      } catch (err) {
        throw badInput({ file: `file is not JSON: ${(err as Error).message}` });
      }
      const file = parseOr400(PatternFileSchema, json);
      const last = file.revisions.length - 1;
      layoutOrBadInput(file.revisions[last]!.spec, `revisions.${last}.spec`);
      return writeTransaction(db, (trx) =>
        insertPattern(trx, deps, {
          shopId: auth.shop.id,
          userId: auth.user.id,
          name: file.pattern.name,
          kind: file.pattern.kind,
          tags: file.pattern.tags,
          archived: file.pattern.archived,
          revisions: file.revisions.map((r) => ({ spec: r.spec, note: r.note, engineVersion: r.engineVersion, createdAt: Date.parse(r.createdAt), restoredFrom: r.restoredFrom })),
          audit: { action: 'pattern.imported', detail: { revisions: file.revisions.length, exportedAt: file.exportedAt } },
        }),
      );
    },
  };
}
export type TransferService = ReturnType<typeof createTransferService>;
