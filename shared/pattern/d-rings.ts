import type { StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength } from '../units/format-length.ts';
import type { HardwarePlacement, PieceLayout, Warning } from './layout-types.ts';

/** One piece of hardware in each of the first `count` folds of `piece` that hold no buckle (no tongue slot). */
export function ringsInFolds(piece: PieceLayout, count: number, item: HardwarePlacement['item'], insideWidthMm: number, wireDiameterMm: number): HardwarePlacement[] {
  const slots = piece.features.filter((f) => f.kind === 'slot');
  const free = piece.folds.filter((fd) => !slots.some((s) => Math.abs(s.atMm - fd.atMm) < 0.05));
  return free.slice(0, count).map((fd) => ({ item, atMm: fd.atMm, insideWidthMm, wireDiameterMm, zoneMm: [fd.atMm, fd.atMm], note: 'the end folds round it' }));
}

/** Clear space (mm) each D-ring's wire wants in the fold loop so it swings freely (from memory). */
export const D_RING_CLEARANCE_MM = 1;

/**
 * Where a collar's D-rings ride: in the fold loop at the buckle end, beside the buckle. The
 * buckle bar sits in the fold and its tongue comes up through the slot; the D-rings' straight
 * bars are held in the same loop on the body side, between the slot's end (or the bar) and
 * the first rivet pair that closes the loop, so one fold and one set of rivets hold both
 * (how collars are commonly made: from memory, no written source found). Several rings share
 * the loop evenly. Returns nothing when the strap's start is not a fold-over (the rings then
 * belong to the bag or another part), and a warning when the loop is too short for them.
 */
export function placeDRings(spec: StrapSpec, strap: PieceLayout, startIsFoldOver: boolean): { placements: HardwarePlacement[]; warnings: Warning[] } {
  const dr = spec.hardware.dRings;
  // Without a buckle the rings are what the strap's folds wrap: one in each fold.
  if (spec.hardware.buckle.style === 'none') return { placements: ringsInFolds(strap, dr.count, 'D-ring', dr.insideWidthMm, dr.wireDiameterMm), warnings: [] };
  const fold = strap.folds.find((f) => f.atMm < strap.blankLengthMm / 2);
  if (!dr.count || !startIsFoldOver || !fold) return { placements: [], warnings: [] };
  const F = fold.atMm;
  const slot = strap.features.find((f) => f.kind === 'slot' && Math.abs(f.atMm - F) < 0.05);
  const from = slot ? F + (slot.lengthMm ?? 0) / 2 : F + fold.barDiameterMm / 2 + spec.hardware.buckle.tongueWireMm;
  // The loop is closed by the nearest body-side partner of a flap hole beyond the fold.
  const closer = strap.features.filter((f) => f.partnerAtMm !== undefined && !f.onFlap && f.atMm > F).sort((a, b) => a.atMm - b.atMm)[0];
  const to = closer ? closer.atMm - (closer.diameterMm ?? 0) / 2 : from + dr.count * (dr.wireDiameterMm + D_RING_CLEARANCE_MM);
  const u = spec.units;
  const warnings: Warning[] = [];
  const need = dr.count * (dr.wireDiameterMm + D_RING_CLEARANCE_MM);
  if (to - from < need - 1e-9)
    warnings.push({ code: 'd-ring-no-room', pieceId: strap.id, message: `${strap.name}: the fold loop between ${slot ? 'the tongue slot' : 'the bar'} and the rivets is ${formatLength(Math.max(0, to - from), u)}; ${dr.count} D-ring${dr.count > 1 ? 's' : ''} of ${formatLength(dr.wireDiameterMm, u)} wire need about ${formatLength(need, u)}` });
  const placements: HardwarePlacement[] = Array.from({ length: dr.count }, (_, i) => ({
    item: 'D-ring',
    atMm: from + ((i + 1) * (to - from)) / (dr.count + 1),
    insideWidthMm: dr.insideWidthMm,
    wireDiameterMm: dr.wireDiameterMm,
    zoneMm: [from, to],
    note: 'rides in the fold loop beside the buckle',
  }));
  return { placements, warnings };
}
