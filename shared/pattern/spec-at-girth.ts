import type { EndShape, EndSpec, PieceSpec, SizeSpec, StrapSpec } from '../schemas/strap-spec.ts';
import { WIDTH_MAX_MM, WIDTH_MIN_MM } from '../schemas/strap-spec.ts';
import { EngineError } from './engine-error.ts';
import { upgradeSpec } from '../schemas/spec-upgrade.ts';

/** Where to fit the pattern: a girth, or one named size of its run. */
export type FitAt = { girthMm: number } | { sizeName: string };

const clampWidth = (w: number) => Math.min(WIDTH_MAX_MM, Math.max(WIDTH_MIN_MM, w));

/** An end shape graded by the width ratio: points, radii and chamfers keep their proportion. */
function scaleShape(shape: EndShape, k: number): EndShape {
  switch (shape.kind) {
    case 'square':
      return shape;
    case 'round':
      return shape.radiusMm === undefined ? shape : { ...shape, radiusMm: shape.radiusMm * k };
    case 'clipped':
      return { ...shape, chamferMm: shape.chamferMm * k };
    case 'english-point':
    case 'spear':
      return { ...shape, depthMm: shape.depthMm * k };
  }
}

/** One end graded by the width ratio: its shape and any hole off the centreline. */
function scaleEnd(end: EndSpec, k: number): EndSpec {
  const holes = <T extends { yMm: number }>(a: T[]) => a.map((h) => ({ ...h, yMm: h.yMm * k }));
  const shape = scaleShape(end.shape, k);
  switch (end.kind) {
    case 'fold-over':
      return { ...end, shape, flapHoles: holes(end.flapHoles), bodyHoles: holes(end.bodyHoles) };
    case 'plain':
      return { ...end, shape, holes: holes(end.holes) };
    case 'fold-back':
      return { ...end, shape, flapHoles: holes(end.flapHoles) };
    case 'adjustable':
      return { ...end, shape };
  }
}

/** The strap piece's tip holes with the size's count and spacing; the middle hole keeps its place in the row. */
function gradeHoles(piece: PieceSpec, holes: NonNullable<SizeSpec['holes']>): PieceSpec {
  if (piece.end.kind !== 'adjustable') return piece;
  const h = piece.end.holes;
  const count = holes.count ?? h.count;
  const middleHole = h.count > 1 ? Math.min(count, 1 + Math.round(((h.middleHole - 1) * (count - 1)) / (h.count - 1))) : Math.ceil(count / 2);
  return { ...piece, end: { ...piece.end, holes: { ...h, count, spacingMm: holes.spacingMm ?? h.spacingMm, middleHole } } };
}

/** The spec with one size's graded width, holes and hardware applied (girth not yet). */
function applySize(spec: StrapSpec, size: SizeSpec): StrapSpec {
  let out = spec;
  if (size.widthMm !== undefined && Math.abs(size.widthMm - spec.widthMm) > 1e-9) {
    const k = size.widthMm / spec.widthMm;
    const dw = size.widthMm - spec.widthMm;
    out = {
      ...out,
      widthMm: size.widthMm,
      // Hardware is bought to the strap's width: it moves with the width unless the size names its own.
      hardware: {
        ...out.hardware,
        buckle: { ...out.hardware.buckle, insideWidthMm: clampWidth(out.hardware.buckle.insideWidthMm + dw) },
        dRings: { ...out.hardware.dRings, insideWidthMm: clampWidth(out.hardware.dRings.insideWidthMm + dw) },
      },
      pieces: out.pieces.map((p) => ({
        ...p,
        ...(p.widthMm !== undefined ? { widthMm: clampWidth(p.widthMm * k) } : {}),
        taper: p.taper.map((s) => ({ ...s, widthMm: clampWidth(s.widthMm * k) })),
        start: scaleEnd(p.start, k),
        end: scaleEnd(p.end, k),
      })),
    };
  }
  if (size.holes) {
    const holes = size.holes;
    out = { ...out, pieces: out.pieces.map((p) => (p.role === 'strap' ? gradeHoles(p, holes) : p)) };
  }
  const hw = size.hardware;
  if (hw?.buckleInsideWidthMm !== undefined || hw?.dRingInsideWidthMm !== undefined) {
    out = {
      ...out,
      hardware: {
        ...out.hardware,
        buckle: { ...out.hardware.buckle, insideWidthMm: hw.buckleInsideWidthMm ?? out.hardware.buckle.insideWidthMm },
        dRings: { ...out.hardware.dRings, insideWidthMm: hw.dRingInsideWidthMm ?? out.hardware.dRings.insideWidthMm },
      },
    };
  }
  return out;
}

/** The size of the run called `name` (case does not matter), or an EngineError on "sizes". */
export function findSize(spec: StrapSpec, name: string): SizeSpec {
  const size = spec.sizes.find((s) => s.name.toLowerCase() === name.trim().toLowerCase());
  if (!size) throw new EngineError('sizes', `there is no size called "${name}" in this pattern's size run`, spec.sizes.length ? `one of ${spec.sizes.map((s) => s.name).join(', ')}` : 'a size of the run');
  return size;
}

/**
 * The same pattern fitted to one girth, or to one size of its run with that size's graded
 * width, holes and hardware, as a single-size spec (no size run). Pure: nothing is saved and
 * the spec passed in is not changed. The result still needs computeLayout to be checked.
 */
export function specAtGirth(stored: StrapSpec, at: FitAt): StrapSpec {
  const spec = upgradeSpec(stored);
  if ('sizeName' in at) {
    const size = findSize(spec, at.sizeName);
    return { ...applySize(spec, size), girthMm: size.girthMm, sizes: [] };
  }
  return { ...spec, girthMm: at.girthMm, sizes: [] };
}
