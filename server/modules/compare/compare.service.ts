// Compares two revisions of a pattern: changed parameters and layout differences.
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { Comparison } from '@shared/schemas/library-views.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { badInput } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import type { LibraryDeps } from '../library-deps.ts';
import { patternOr404 } from '../patterns/pattern-access.ts';
import { layoutDiff, type LayoutDiff } from './layout-diff.ts';
import { specChanges } from './spec-diff.ts';

export type { Comparison };

export async function compareRevisions(deps: LibraryDeps, auth: AuthContext, patternRaw: string | undefined, q: { from: number; to: number }): Promise<Comparison> {
  const p = await patternOr404(deps.repos.patterns, patternRaw, auth.shop.id);
  for (const field of ['from', 'to'] as const) {
    if (q[field] > p.head_number) throw badInput({ [field]: `${field} must be between 1 and ${p.head_number}` });
  }
  const [a, b] = await Promise.all([deps.repos.revisions.byNumber(p.id, q.from), deps.repos.revisions.byNumber(p.id, q.to)]);
  const specA = JSON.parse(a!.spec) as StrapSpec;
  const specB = JSON.parse(b!.spec) as StrapSpec;
  let layout: LayoutDiff | null = null;
  let layoutError: string | null = null;
  try {
    layout = layoutDiff(computeLayout(specA), computeLayout(specB));
  } catch (err) {
    // A revision saved under older rules may no longer lay out; still show the parameters.
    if (!(err instanceof EngineError)) throw err;
    layoutError = err.toLine();
  }
  return { from: q.from, to: q.to, params: specChanges(specA, specB), layout, layoutError };
}
