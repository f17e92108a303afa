// The order's piece: its saved revision fitted to the order's girth with specAtGirth (one
// size of the run, or a measured girth). No revision is created; the fitted spec lives only
// in memory. Layouts are remembered per (revision, girth) because the board prices every row.
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import { specAtGirth } from '@shared/pattern/spec-at-girth.ts';
import { StrapSpecSchema, type StrapSpec } from '@shared/schemas/strap-spec.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { HttpError, badInput } from '../../http/http-error.ts';

export interface FittedPiece {
  spec: StrapSpec;
  layout: PatternLayout;
  girthMm: number;
}

const memo = new Map<string, FittedPiece>();
const MEMO_MAX = 500;

/** The spec's girth for one size of its run, or a 400 naming the size field. */
export function sizeGirthMm(spec: StrapSpec, sizeName: string): number {
  const size = (spec.sizes ?? []).find((s) => s.name === sizeName);
  if (!size) {
    const names = (spec.sizes ?? []).map((s) => s.name);
    throw badInput({ 'fit.sizeName': names.length ? `Size must be one of ${names.join(', ')}` : 'Size: this revision has no size run; use a measurement' });
  }
  return size.girthMm;
}

/** The revision fitted to a girth or a size; a girth the engine cannot draw answers 400 naming it. */
export function fitPiece(revisionKey: string, saved: StrapSpec, at: { girthMm: number } | { sizeName: string }): FittedPiece {
  const key = `${revisionKey}|${'sizeName' in at ? `s:${at.sizeName}` : `g:${at.girthMm}`}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const girthMm = 'sizeName' in at ? sizeGirthMm(saved, at.sizeName) : at.girthMm;
  let fitted: FittedPiece;
  try {
    const spec = StrapSpecSchema.parse(specAtGirth(saved, at));
    fitted = { spec, layout: computeLayout(spec), girthMm };
  } catch (err) {
    if (err instanceof EngineError) {
      throw new HttpError(422, 'girth_not_drawable', `At a girth of ${formatLength(girthMm, saved.units)} this pattern cannot be made: ${err.message}`, { fit: `Girth of ${formatLength(girthMm, saved.units)}: ${err.message}` });
    }
    throw err;
  }
  if (memo.size >= MEMO_MAX) memo.delete(memo.keys().next().value!);
  memo.set(key, fitted);
  return fitted;
}

/**
 * What a customer can check: the finished length from the buckle bar (the first fold) to the
 * tip, and the girths the holes fit (inner lengths at the tightest and loosest hole).
 */
export function fittedLengths(layout: PatternLayout): { finishedLengthMm: number; fitRangeMm: [number, number] | null; blankLengthMm: number } {
  const strap = layout.pieces[0]!;
  const fold = strap.folds[0];
  const finished = fold ? strap.blankLengthMm - fold.atMm : strap.blankLengthMm;
  return { finishedLengthMm: Math.round(finished * 10) / 10, fitRangeMm: layout.fit?.rangeMm ?? null, blankLengthMm: strap.blankLengthMm };
}
