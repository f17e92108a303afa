import type { EndShape } from '../schemas/strap-spec.ts';
import { endShapePrims } from './end-shape.ts';
import { mirrorPrimX, reversePrim, translatePrim, type Prim } from './prims.ts';
import type { WidthProfile } from './width-profile.ts';

/**
 * The cut outline of a piece as a closed, clockwise chain (y down): top edge from the
 * start to the end, the end shape, the bottom edge back, the start shape (the end shape's
 * mirror image).
 */
export function pieceOutline(profile: WidthProfile, startShape: EndShape, endShape: EndShape): Prim[] {
  const { stations, x0, x1 } = profile;
  const top: Prim[] = [];
  for (let i = 1; i < stations.length; i++) {
    const a = stations[i - 1]!;
    const b = stations[i]!;
    if (b.atMm - a.atMm < 1e-9) continue;
    top.push({ type: 'line', a: { x: a.atMm, y: -a.widthMm / 2 }, b: { x: b.atMm, y: -b.widthMm / 2 } });
  }
  const bottom = top
    .map((p) => (p.type === 'line' ? reversePrim({ type: 'line', a: { x: p.a.x, y: -p.a.y }, b: { x: p.b.x, y: -p.b.y } }) : p))
    .reverse();
  const endPrims = endShapePrims(endShape, profile.endWidthMm).map((p) => translatePrim(p, x1, 0));
  // The start shape: build it as an end shape at x0, mirror it about x0, then run it bottom to top.
  const startPrims = endShapePrims(startShape, profile.startWidthMm)
    .map((p) => mirrorPrimX(translatePrim(p, x0, 0), x0))
    .map(reversePrim)
    .reverse();
  return [...top, ...endPrims, ...bottom, ...startPrims];
}
