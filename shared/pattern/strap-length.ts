import type { PieceSpec, StrapSpec } from '../schemas/strap-spec.ts';
import { centrelineFromInnerMm, innerCircumferenceMm } from './bend.ts';
import { attachFromEndMm } from './end-features.ts';
import { fieldError } from './engine-error.ts';
import type { FitReport } from './layout-types.ts';

/** What the loop round the body holds besides the strap piece itself (mm). */
export interface LoopParts {
  thicknessMm: number;
  /** Bridge pieces (bar to bar) plus the spec's fixed loop extra, mm. */
  outsideMm: number;
}

/** Adjustment hole centres (mm from the datum, ascending) on a strap `lengthMm` long. */
export function adjustmentHolesMm(piece: PieceSpec, lengthMm: number): number[] {
  if (piece.end.kind !== 'adjustable') return [];
  const { count, spacingMm, firstFromTipMm } = piece.end.holes;
  return Array.from({ length: count }, (_, i) => lengthMm - firstFromTipMm - (count - 1 - i) * spacingMm);
}

/** Inner length (mm) of the loop for a centreline length, when the strap closes round the body. */
function inner(spec: StrapSpec, loopMm: number, t: number): number {
  return spec.closes ? innerCircumferenceMm(loopMm, t) : loopMm;
}

/**
 * Blank length (mm) of the strap piece in a mode.
 * rule: the trade's rule of thumb (`blank` = girth + allowance; `nominal-hole`: bar to nominal
 * hole = girth + allowance; `fixed`: a stock length).
 * fit: the nominal hole (or the far attachment) lands where the loop's inner length equals
 * girth + ease, the loop's centreline being inner + pi x T when the strap closes.
 */
export function strapBlankMm(spec: StrapSpec, piece: PieceSpec, mode: 'rule' | 'fit', parts: LoopParts, field: string): number {
  const t = parts.thicknessMm;
  const a = attachFromEndMm(piece.start, t);
  const adj = piece.end.kind === 'adjustable' ? piece.end.holes : null;
  if (adj && adj.middleHole > adj.count)
    throw fieldError(spec, `${field}.end.holes.middleHole`, `there is no hole ${adj.middleHole}; the tip has ${adj.count} holes`, `at most ${adj.count}`);
  const beyondNominal = adj ? (adj.count - adj.middleHole) * adj.spacingMm + adj.firstFromTipMm : attachFromEndMm(piece.end, t);
  if (mode === 'rule') {
    const r = spec.rule;
    if (r.measure === 'fixed') return r.blankMm;
    if (r.measure === 'blank') return spec.girthMm + r.allowanceMm;
    if (!adj) throw fieldError(spec, 'rule.measure', 'measuring to the hole it is fitted at needs a strap with adjustment holes at the tip', 'blank or fixed');
    return a + spec.girthMm + r.allowanceMm + beyondNominal;
  }
  const targetMm = spec.girthMm + spec.easeMm;
  const loopMm = spec.closes ? centrelineFromInnerMm(targetMm, t) : targetMm;
  return a + loopMm - parts.outsideMm + beyondNominal;
}

/** The fit at each adjustment hole (or at the far attachment of a strap without holes). */
export function fitReport(spec: StrapSpec, piece: PieceSpec, lengthMm: number, parts: LoopParts): FitReport {
  const t = parts.thicknessMm;
  const a = attachFromEndMm(piece.start, t);
  const targetMm = spec.girthMm + spec.easeMm;
  const at = piece.end.kind === 'adjustable' ? adjustmentHolesMm(piece, lengthMm) : [lengthMm - attachFromEndMm(piece.end, t)];
  const holes = at.map((atMm) => {
    const loopMm = atMm - a + parts.outsideMm;
    return { atMm, loopMm, innerMm: inner(spec, loopMm, t) };
  });
  // The layout indexes its holes from 0; the spec numbers them from 1 as people do.
  const nominalIndex = piece.end.kind === 'adjustable' ? piece.end.holes.middleHole - 1 : 0;
  const inners = holes.map((h) => h.innerMm);
  const nominal = holes[nominalIndex] ?? holes[0]!;
  return {
    holes,
    nominalIndex,
    rangeMm: [Math.min(...inners), Math.max(...inners)],
    targetMm,
    deviationMm: nominal.innerMm - targetMm,
  };
}
