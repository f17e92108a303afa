import type { EndSpec } from '../schemas/strap-spec.ts';
import { bendAllowanceMm, centrelineFromInnerMm } from './bend.ts';
import { fieldError, lengthIn, MM_WORDING, type Wording } from './engine-error.ts';
import type { Feature, FeatureKind } from './layout-types.ts';
import { nearestPunch } from './punch.ts';

/** Which end of a piece: the start (datum, x = 0) or the end (x = blank length). */
export type EndSide = 'start' | 'end';

/** Features, folds and the attachment point one end contributes. */
export interface EndPlacement {
  features: Feature[];
  folds: { atMm: number; bendAllowanceMm: number; barDiameterMm: number }[];
}

/** Partners closer than this to a listed body hole are the same hole (mm). */
const SAME_HOLE_MM = 0.5;

/**
 * Where the loop is measured from at this end, in mm from that end: the fold line of a
 * fold-over (the bar sits in it) or of a fold-back loop (its apex), the innermost hole of a
 * plain end, 0 otherwise.
 */
export function attachFromEndMm(end: EndSpec, thicknessMm: number): number {
  switch (end.kind) {
    case 'fold-over':
      return end.foldAtMm;
    case 'fold-back':
      return foldBackApexMm(end, thicknessMm);
    case 'plain':
      return end.holes.reduce((m, h) => Math.max(m, h.fromEndMm), 0);
    case 'adjustable':
      return 0;
  }
}

/** Apex of a fold-back loop from its end (mm): the overlap plus half the loop's centreline. */
export function foldBackApexMm(end: EndSpec & { kind: 'fold-back' }, thicknessMm: number): number {
  return end.overlapMm + centrelineFromInnerMm(end.loopInnerMm, thicknessMm) / 2;
}

function holeKind(f: string): FeatureKind {
  return f === 'rivet' || f === 'screw' || f === 'snap' ? f : 'hole';
}

/**
 * Places an end's features on a piece `lengthMm` long. Positions from the end are turned into
 * datum positions (x = L - d at the end side). Flap holes of folds get partners mirrored in
 * the fold line (x' = 2F - x): with a symmetric bend the two straight legs meet point for
 * point, whatever the bend allowance. A listed body hole on a partner's spot is that partner.
 */
export function placeEnd(end: EndSpec, side: EndSide, lengthMm: number, thicknessMm: number, k: number, field: string, w: Wording = MM_WORDING): EndPlacement {
  const len = lengthIn(w);
  const toX = (d: number) => (side === 'start' ? d : lengthMm - d);
  const features: Feature[] = [];
  const folds: EndPlacement['folds'] = [];
  const hole = (kind: FeatureKind, atMm: number, yMm: number, diameterMm: number, layers: number, label: string, partnerAtMm?: number): Feature => ({
    kind,
    atMm,
    yMm,
    diameterMm,
    punch: nearestPunch(diameterMm),
    layers,
    ...(partnerAtMm !== undefined ? { partnerAtMm } : {}),
    label,
  });
  if (end.kind === 'plain') {
    end.holes.forEach((h, i) => {
      if (h.fromEndMm >= lengthMm) throw fieldError(w, `${field}.holes.${i}.fromEndMm`, `${len(h.fromEndMm)} lies beyond the ${len(lengthMm)} blank`, `less than ${len(lengthMm)}`);
      features.push(hole(holeKind(h.fastener), toX(h.fromEndMm), h.yMm, h.diameterMm, 1, h.fastener));
    });
  }
  if (end.kind === 'fold-over' || end.kind === 'fold-back') {
    const foldD = end.kind === 'fold-over' ? end.foldAtMm : foldBackApexMm(end, thicknessMm);
    if (2 * foldD >= lengthMm)
      throw fieldError(w, `${field}.${end.kind === 'fold-over' ? 'foldAtMm' : 'overlapMm'}`, `a fold ${len(foldD)} from the end needs a blank longer than ${len(2 * foldD)}; the blank is ${len(lengthMm)}`, `at most half the blank (${len(lengthMm / 2)})`);
    const F = toX(foldD);
    const barDiameterMm = end.kind === 'fold-over' ? end.barDiameterMm : 0;
    const radiusMm = end.kind === 'fold-over' ? barDiameterMm / 2 : centrelineFromInnerMm(end.loopInnerMm, thicknessMm) / (2 * Math.PI) - thicknessMm / 2;
    folds.push({ atMm: F, bendAllowanceMm: bendAllowanceMm(Math.PI, Math.max(0, radiusMm), thicknessMm, k), barDiameterMm });
    features.push({ kind: 'fold', atMm: F, yMm: 0, layers: 1, label: end.kind === 'fold-over' ? 'fold' : 'loop fold' });
    const body = end.kind === 'fold-over' ? end.bodyHoles.map((h) => ({ ...h, used: false })) : [];
    end.flapHoles.forEach((h, i) => {
      if (h.fromEndMm >= foldD) throw fieldError(w, `${field}.flapHoles.${i}.fromEndMm`, `${len(h.fromEndMm)} is not on the flap (the fold is ${len(foldD)} from the end)`, `less than ${len(foldD)}`);
      const x = toX(h.fromEndMm);
      const px = 2 * F - x;
      const kind = holeKind(h.fastener);
      const same = body.find((b) => !b.used && Math.abs(toX(b.fromEndMm) - px) < SAME_HOLE_MM && Math.abs(b.yMm - h.yMm) < SAME_HOLE_MM);
      if (same) same.used = true;
      features.push({ ...hole(kind, x, h.yMm, h.diameterMm, 2, `${h.fastener}, flap`, px), onFlap: true });
      features.push(hole(kind, px, h.yMm, h.diameterMm, 2, `${h.fastener}, body`, x));
    });
    body.forEach((b, i) => {
      if (b.used) return;
      if (b.fromEndMm <= foldD || b.fromEndMm >= lengthMm)
        throw fieldError(w, `${field}.bodyHoles.${i}.fromEndMm`, `${len(b.fromEndMm)} must lie past the fold (${len(foldD)} from the end) and on the blank`, `between ${len(foldD)} and ${len(lengthMm)}`);
      features.push(hole(holeKind(b.fastener), toX(b.fromEndMm), b.yMm, b.diameterMm, 1, `${b.fastener}, 1 layer`));
    });
    if (end.kind === 'fold-over' && end.slot) {
      if (end.slot.lengthMm / 2 >= foldD)
        throw fieldError(w, `${field}.slot.lengthMm`, `a ${len(end.slot.lengthMm)} slot centred on the fold ${len(foldD)} from the end runs off the end`, `less than ${len(2 * foldD)}`);
      features.push({ kind: 'slot', atMm: F, yMm: 0, lengthMm: end.slot.lengthMm, widthMm: end.slot.widthMm, layers: 1, label: 'tongue slot' });
    }
  }
  return { features, folds };
}
