import type { PieceSpec } from '../schemas/strap-spec.ts';
import { shapeDepthMm } from './end-shape.ts';

/** A piece's width along its length, resolved to the datum. */
export interface WidthProfile {
  /** Stations sorted by x (mm from the datum); width linear between them, constant outside. */
  stations: { atMm: number; widthMm: number }[];
  /** Straight edges run from `x0` to `x1`; the end shapes lie outside (mm). */
  x0: number;
  x1: number;
  startWidthMm: number;
  endWidthMm: number;
  maxWidthMm: number;
  /** Width (mm) at `x`; inside an end shape it is the width where the shape starts. */
  at(x: number): number;
}

function interpolate(stations: readonly { atMm: number; widthMm: number }[], x: number): number {
  const first = stations[0];
  const last = stations[stations.length - 1];
  if (!first || !last) return 0;
  if (x <= first.atMm) return first.widthMm;
  if (x >= last.atMm) return last.widthMm;
  for (let i = 1; i < stations.length; i++) {
    const a = stations[i - 1]!;
    const b = stations[i]!;
    if (x <= b.atMm) return b.atMm === a.atMm ? b.widthMm : a.widthMm + ((x - a.atMm) / (b.atMm - a.atMm)) * (b.widthMm - a.widthMm);
  }
  return last.widthMm;
}

/**
 * Width profile of a piece `lengthMm` long. Taper stations are measured from the start or
 * the end; a taper stops where an end shape begins, so the shape always meets parallel
 * edges (tangent arcs stay tangent).
 */
export function widthProfile(piece: PieceSpec, baseWidthMm: number, lengthMm: number): WidthProfile {
  const raw = piece.taper
    .map((s) => ({ atMm: s.from === 'start' ? s.atMm : lengthMm - s.atMm, widthMm: s.widthMm }))
    .sort((a, b) => a.atMm - b.atMm);
  const stations = raw.length ? raw : [{ atMm: 0, widthMm: piece.widthMm ?? baseWidthMm }];
  const x0 = shapeDepthMm(piece.start.shape, interpolate(stations, 0));
  const x1 = lengthMm - shapeDepthMm(piece.end.shape, interpolate(stations, lengthMm));
  const inner = stations.filter((s) => s.atMm > x0 && s.atMm < x1);
  const clipped = [{ atMm: x0, widthMm: interpolate(stations, x0) }, ...inner, { atMm: x1, widthMm: interpolate(stations, x1) }];
  const at = (x: number) => interpolate(clipped, Math.min(Math.max(x, x0), x1));
  return {
    stations: clipped,
    x0,
    x1,
    startWidthMm: at(x0),
    endWidthMm: at(x1),
    maxWidthMm: Math.max(...clipped.map((s) => s.widthMm)),
    at,
  };
}
