import type { StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength } from '../units/format-length.ts';
import { bendAllowanceMm } from './bend.ts';
import type { Feature, FitReport, PieceLayout, Warning } from './layout-types.ts';
import type { WidthProfile } from './width-profile.ts';

/** Fastener centres at least this far from an edge and from each other (common practice). */
export const FASTENER_EDGE_MM = 8;
/** Least web of leather between two holes or a hole and a slot (from memory). */
export const MIN_WEB_MM = 2;
/** Width may differ from the hardware's inside width by this much before we warn (mm). */
export const HARDWARE_SLACK_MM = { over: 0.5, under: 2 };

const isFastener = (f: Feature) => f.kind === 'rivet' || f.kind === 'screw' || f.kind === 'snap';
const isRound = (f: Feature) => f.diameterMm !== undefined;

// Module-level, not inside webMm: webMm runs for every pair of holes, and a closure made per
// call is renamed (esbuild keepNames, which tsx uses) each time, a cost the profile showed.
const ext = (f: Feature) => (isRound(f) ? f.diameterMm! / 2 : (f.widthMm ?? 0) / 2);
const half = (f: Feature) => (f.kind === 'slot' ? Math.max(0, (f.lengthMm ?? 0) - (f.widthMm ?? 0)) / 2 : 0);

/** Shortest leather web between two features on the piece (mm); slots are stadiums. */
function webMm(a: Feature, b: Feature): number {
  const dx = Math.max(0, Math.abs(a.atMm - b.atMm) - half(a) - half(b));
  return Math.hypot(dx, a.yMm - b.yMm) - ext(a) - ext(b);
}

/** Geometry warnings of one piece: edges, spacing, bends, slot, hardware width. */
export function pieceWarnings(spec: StrapSpec, piece: PieceLayout, profile: WidthProfile, t: number, fold: { slotHolder: boolean }): Warning[] {
  const u = spec.units;
  const out: Warning[] = [];
  const w = (code: Warning['code'], message: string) => out.push({ code, message, pieceId: piece.id });
  const holes = piece.features.filter((f) => isRound(f) || f.kind === 'slot');
  for (const f of holes) {
    const edge = profile.at(f.atMm) / 2 - Math.abs(f.yMm);
    const need = isFastener(f) ? FASTENER_EDGE_MM : (f.diameterMm ?? f.widthMm ?? 0) / 2 + MIN_WEB_MM;
    if (edge < need - 1e-6)
      w('hole-near-edge', `${piece.name}: the centre of ${f.label} at ${formatLength(f.atMm, u)} is ${formatLength(edge, u)} from the edge; it needs ${formatLength(need, u)}`);
  }
  for (let i = 0; i < holes.length; i++)
    for (let j = i + 1; j < holes.length; j++) {
      const a = holes[i]!, b = holes[j]!;
      const web = webMm(a, b);
      const centres = Math.hypot(a.atMm - b.atMm, a.yMm - b.yMm);
      if (web < MIN_WEB_MM - 1e-6 || (isFastener(a) && isFastener(b) && centres < FASTENER_EDGE_MM - 1e-6))
        w('features-too-close', `${piece.name}: ${a.label} at ${formatLength(a.atMm, u)} and ${b.label} at ${formatLength(b.atMm, u)} leave ${formatLength(Math.max(0, web), u)} of leather between them`);
    }
  for (const fd of piece.folds) {
    if (fd.barDiameterMm <= 0) continue;
    // The legs lie flat together only past the bar: bar radius plus one thickness from the fold.
    const flatFrom = fd.barDiameterMm / 2 + t;
    for (const f of piece.features.filter(isFastener)) {
      const d = Math.abs(f.atMm - fd.atMm) - (f.diameterMm ?? 0) / 2;
      if (f.partnerAtMm !== undefined && d < flatFrom)
        w('rivet-on-bend', `${piece.name}: ${f.label} at ${formatLength(f.atMm, u)} sits on the bend round the bar (needs ${formatLength(flatFrom, u)} clear of the fold)`);
    }
  }
  if (fold.slotHolder && spec.hardware.buckle.style !== 'none') {
    const slot = piece.features.find((f) => f.kind === 'slot');
    const fd = slot ? piece.folds.find((x) => Math.abs(x.atMm - slot.atMm) < 1e-6) : undefined;
    if (slot && fd) {
      // Our model: the tongue wraps the bar and swings through the bend: BA(180°) + its wire each side.
      const need = bendAllowanceMm(Math.PI, fd.barDiameterMm / 2, t, spec.foldK) + 2 * spec.hardware.buckle.tongueWireMm;
      if ((slot.lengthMm ?? 0) < need - 1e-6)
        w('tongue-slot-short', `${piece.name}: tongue slot ${formatLength(slot.lengthMm ?? 0, u)} is shorter than the ${formatLength(need, u)} the tongue needs to swing`);
    }
    const bw = spec.hardware.buckle.insideWidthMm;
    const sw = profile.startWidthMm;
    if (sw > bw + HARDWARE_SLACK_MM.over || sw < bw - HARDWARE_SLACK_MM.under)
      w('width-hardware-mismatch', `${piece.name}: width ${formatLength(sw, u)} at the buckle does not match the buckle's ${formatLength(bw, u)} inside width`);
  }
  return out;
}

/**
 * What two fingers laid flat under the tape add to a neck measure: about 1 in (common
 * practice: a collar fits when two fingers slip under it, and collars are measured that way).
 */
export const TWO_FINGER_ROOM_MM = 25.4;

/**
 * The bare neck under a collar, mm: the girth measured snug, or the two-finger measure less
 * the fingers' room. Our rule: at its middle hole a collar must not close tighter than this.
 * The trade's rule-mode collar (blank = loose neck + 8 in, common practice) closes about
 * 3/4 in under the loose measure, 1/4 in over the bare neck: it passes; anything tighter warns.
 */
export function bareNeckMm(spec: Pick<StrapSpec, 'girthMm' | 'girthMeasured'>): number {
  return spec.girthMeasured === 'two-fingers' ? spec.girthMm - TWO_FINGER_ROOM_MM : spec.girthMm;
}

/** Pattern-level warnings: tail, fit range, D-rings, strip length, tip through the buckle. */
export function patternWarnings(spec: StrapSpec, strap: PieceLayout, fit: FitReport, strapProfile: WidthProfile, t: number, keeperWidthMm: number): Warning[] {
  const u = spec.units;
  const out: Warning[] = [];
  const add = (code: Warning['code'], message: string, pieceId?: string) => out.push({ code, message, ...(pieceId ? { pieceId } : {}) });
  const b = spec.hardware.buckle;
  if (b.style !== 'none' && strap.fit && spec.pieces.some((p) => p.end.kind === 'adjustable')) {
    const nominal = fit.holes[fit.nominalIndex];
    const tail = nominal ? strap.blankLengthMm - nominal.atMm : 0;
    // Past the tongue the tail must clear the frame and slip through each keeper (its width plus two layers).
    const need = b.tongueLengthMm + spec.hardware.keepers * (keeperWidthMm + 2 * t) + 6;
    if (tail < need - 1e-6)
      add('tail-short', `the tail past the middle hole is ${formatLength(tail, u)}; passing the buckle${spec.hardware.keepers ? ' and keeper' : ''} takes about ${formatLength(need, u)}`, strap.id);
    const tw = strapProfile.endWidthMm;
    if (tw > b.insideWidthMm + HARDWARE_SLACK_MM.over)
      add('width-hardware-mismatch', `tip width ${formatLength(tw, u)} will not pass the buckle's ${formatLength(b.insideWidthMm, u)} inside width`, strap.id);
  }
  const lo = fit.rangeMm[0], hi = fit.rangeMm[1];
  const tol = spec.pieces.some((p) => p.end.kind === 'adjustable') ? 1e-6 : 3;
  const how = spec.mode === 'rule' ? 'by the shop rule' : 'fitted to the measure';
  const holes = spec.pieces.some((p) => p.end.kind === 'adjustable');
  if ((fit.targetMm < lo - tol || fit.targetMm > hi + tol) && !holes)
    add('fit-misses-target', `the length ${how} gives ${formatLength(lo, u)}, not the girth${spec.easeMm ? ' plus ease' : ''} of ${formatLength(fit.targetMm, u)}`, strap.id);
  else if (fit.targetMm < lo - tol || fit.targetMm > hi + tol)
    add('fit-misses-target', `the girth${spec.easeMm ? ' plus ease' : ''}, ${formatLength(fit.targetMm, u)}, is outside what the holes fit, ${formatLength(lo, u)} to ${formatLength(hi, u)} (length ${spec.mode === 'rule' ? 'by the shop rule' : 'fitted to the measure'})`, strap.id);
  // A collar must not close tighter than the bare neck at the hole it is meant to be worn on
  // (bareNeckMm); the maker still checks with two fingers under it (common practice).
  const middle = fit.holes[fit.nominalIndex];
  const bare = bareNeckMm(spec);
  if (spec.kind === 'collar' && spec.closes && middle && middle.innerMm < bare - 1e-6) {
    const how =
      spec.girthMeasured === 'two-fingers'
        ? `the bare neck (about ${formatLength(bare, u)}: the ${formatLength(spec.girthMm, u)} measured over two fingers, less ${formatLength(TWO_FINGER_ROOM_MM, u)} for the fingers)`
        : `the ${formatLength(bare, u)} neck measured snug`;
    add(
      'collar-tight-at-nominal',
      `at the middle hole (hole ${fit.nominalIndex + 1}) the collar is ${formatLength(middle.innerMm, u)} inside, ${formatLength(bare - middle.innerMm, u)} tighter than ${how}: it will choke. Lengthen the blank, or fit the length to the measure`,
      strap.id,
    );
  }
  const dr = spec.hardware.dRings;
  if (dr.count > 0 && (strapProfile.startWidthMm > dr.insideWidthMm + HARDWARE_SLACK_MM.over || strapProfile.startWidthMm < dr.insideWidthMm - HARDWARE_SLACK_MM.under))
    add('width-hardware-mismatch', `width ${formatLength(strapProfile.startWidthMm, u)} does not match the D-rings' ${formatLength(dr.insideWidthMm, u)} inside width`, strap.id);
  return out;
}
