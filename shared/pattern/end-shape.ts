import type { EndShape } from '../schemas/strap-spec.ts';
import { fieldError, lengthIn, MM_WORDING, type Wording } from './engine-error.ts';
import type { Prim } from './prims.ts';

/**
 * How far (mm) an end shape reaches beyond the point where the straight edges stop:
 * square 0, round r, clipped c, English point and spear their depth.
 */
export function shapeDepthMm(shape: EndShape, widthMm: number): number {
  switch (shape.kind) {
    case 'square':
      return 0;
    case 'round':
      return shape.radiusMm ?? widthMm / 2;
    case 'clipped':
      return shape.chamferMm;
    case 'english-point':
    case 'spear':
      return shape.depthMm;
  }
}

/** Throws an {@link EngineError} on `field` when the shape cannot be drawn at this width. */
export function checkShape(shape: EndShape, widthMm: number, field: string, w: Wording = MM_WORDING): void {
  const h = widthMm / 2;
  const len = lengthIn(w);
  if (shape.kind === 'round' && (shape.radiusMm ?? h) > h + 1e-9)
    throw fieldError(w, `${field}.radiusMm`, `${len(shape.radiusMm ?? h)} is more than half the width (${len(h)})`, `at most ${len(h)}`);
  if (shape.kind === 'clipped' && shape.chamferMm > h + 1e-9)
    throw fieldError(w, `${field}.chamferMm`, `${len(shape.chamferMm)} is more than half the width (${len(h)})`, `at most ${len(h)}`);
  // Two arcs tangent to the edges meet in a point only if the point reaches at least w/2.
  if (shape.kind === 'english-point' && shape.depthMm < h - 1e-9)
    throw fieldError(w, `${field}.depthMm`, `an English point needs at least half the width (${len(h)}), got ${len(shape.depthMm)}`, `at least ${len(h)}`);
}

/**
 * Radius (mm) of each English-point arc: tangent to the edge at the start of the point and
 * through the point on the centreline, d² + (ρ - h)² = ρ², so ρ = (d² + h²) / 2h.
 */
export function englishPointRadiusMm(depthMm: number, widthMm: number): number {
  const h = widthMm / 2;
  return (depthMm * depthMm + h * h) / (2 * h);
}

/**
 * The end shape as primitives in a local frame: u = 0 where the straight edges stop, u > 0
 * beyond; runs from the top edge (y = -w/2) to the bottom edge (y = +w/2), clockwise.
 */
export function endShapePrims(shape: EndShape, widthMm: number): Prim[] {
  const h = widthMm / 2;
  const line = (ax: number, ay: number, bx: number, by: number): Prim => ({ type: 'line', a: { x: ax, y: ay }, b: { x: bx, y: by } });
  switch (shape.kind) {
    case 'square':
      return [line(0, -h, 0, h)];
    case 'round': {
      const r = shape.radiusMm ?? h;
      const out: Prim[] = [{ type: 'arc', c: { x: 0, y: -h + r }, r, a0: -Math.PI / 2, a1: 0 }];
      if (h - r > 1e-9) out.push(line(r, -h + r, r, h - r));
      out.push({ type: 'arc', c: { x: 0, y: h - r }, r, a0: 0, a1: Math.PI / 2 });
      return out;
    }
    case 'clipped': {
      const c = shape.chamferMm;
      const out: Prim[] = [line(0, -h, c, -h + c)];
      if (h - c > 1e-9) out.push(line(c, -h + c, c, h - c));
      out.push(line(c, h - c, 0, h));
      return out;
    }
    case 'english-point': {
      const d = shape.depthMm;
      const rho = englishPointRadiusMm(d, widthMm);
      return [
        { type: 'arc', c: { x: 0, y: -h + rho }, r: rho, a0: -Math.PI / 2, a1: Math.atan2(h - rho, d) },
        { type: 'arc', c: { x: 0, y: h - rho }, r: rho, a0: Math.atan2(rho - h, d), a1: Math.PI / 2 },
      ];
    }
    case 'spear':
      return [line(0, -h, shape.depthMm, 0), line(shape.depthMm, 0, 0, h)];
  }
}
