import type { PieceSpec, StrapSpec } from '../schemas/strap-spec.ts';
import { BLANK_MAX_MM } from '../schemas/strap-spec.ts';
import { upgradeSpec } from '../schemas/spec-upgrade.ts';
import { formatLength } from '../units/format-length.ts';
import { thicknessMm } from '../units/length.ts';
import { centrelineFromInnerMm } from './bend.ts';
import { cutList } from './cut-list.ts';
import { placeDRings, ringsInFolds } from './d-rings.ts';
import { checkShape } from './end-shape.ts';
import { attachFromEndMm, placeEnd } from './end-features.ts';
import { EngineError, fieldError, lengthIn } from './engine-error.ts';
import { ENGINE_VERSION } from './engine-version.ts';
import { patternWarnings, pieceWarnings } from './checks.ts';
import type { Feature, PatternLayout, PieceLayout, Warning } from './layout-types.ts';
import { nearestPunch } from './punch.ts';
import { ruleVsFit } from './rule-vs-fit.ts';
import { layoutStitchRow } from './stitch.ts';
import { pieceOutline } from './outline.ts';
import { adjustmentHolesMm, fitReport, strapBlankMm, type LoopParts } from './strap-length.ts';
import { widthProfile } from './width-profile.ts';
import { roundLayoutNumbers } from './round-layout.ts';

/** Blank length (mm) of a piece that is not the strap. */
function otherBlankMm(spec: StrapSpec, piece: PieceSpec, t: number, field: string): number {
  const len = piece.length;
  if (len.kind === 'fixed') return len.blankMm;
  if (len.kind === 'keeper') {
    // Inside a keeper: round `layers` of the strap, 2 x (width + layers x T), plus ease; its centreline adds pi x T.
    const innerMm = 2 * (spec.widthMm + len.layers * t) + len.easeMm;
    return centrelineFromInnerMm(innerMm, t) + len.overlapMm;
  }
  throw fieldError(spec, `${field}.length.kind`, 'only the strap takes its length from the girth; give this piece a blank length or make it a keeper', 'fixed or keeper');
}

/** Lays out one piece `lengthMm` long. */
function layoutPiece(spec: StrapSpec, piece: PieceSpec, index: number, lengthMm: number, t: number): { layout: PieceLayout; profile: ReturnType<typeof widthProfile> } {
  const field = `pieces.${index}`;
  const len = lengthIn(spec);
  if (!(lengthMm > 0) || lengthMm > BLANK_MAX_MM)
    throw fieldError(spec, `${field}.length`, `the blank would be ${len(lengthMm)} long; it must be between 0 and ${len(BLANK_MAX_MM)}`, `between 0 and ${len(BLANK_MAX_MM)}`);
  if (piece.start.kind === 'adjustable') throw fieldError(spec, `${field}.start.kind`, 'adjustment holes go at the tip, not at the buckle end', 'folded, plain or looped');
  const profile = widthProfile(piece, spec.widthMm, lengthMm);
  if (profile.x1 - profile.x0 < 0) throw fieldError(spec, `${field}.end.shape`, `the two end shapes (${len(lengthMm - (profile.x1 - profile.x0))}) are longer than the ${len(lengthMm)} blank`, `less than ${len(lengthMm)} together`);
  checkShape(piece.start.shape, profile.startWidthMm, `${field}.start.shape`, spec);
  checkShape(piece.end.shape, profile.endWidthMm, `${field}.end.shape`, spec);
  const s = placeEnd(piece.start, 'start', lengthMm, t, spec.foldK, `${field}.start`, spec);
  const e = placeEnd(piece.end, 'end', lengthMm, t, spec.foldK, `${field}.end`, spec);
  const features: Feature[] = [...s.features, ...e.features];
  if (piece.end.kind === 'adjustable') {
    const h = piece.end.holes;
    const at = adjustmentHolesMm(piece, lengthMm);
    const startZone = attachFromEndMm(piece.start, t) * (piece.start.kind === 'plain' ? 1 : 2);
    const first = at[0] ?? 0;
    if (first - h.diameterMm / 2 <= startZone)
      throw new EngineError(
        `${field}.end.holes.count`,
        `${piece.role === 'strap' ? 'Tip holes' : `${piece.name}: tip holes`}: ${h.count} holes ${len(h.spacingMm)} apart need ${len((h.count - 1) * h.spacingMm + h.firstFromTipMm)} from the tip, ${len(lengthMm - startZone)} available before the buckle end`,
        `at most ${len(lengthMm - startZone)} of holes and tip`,
      );
    at.forEach((x, i) => features.push({ kind: 'adjust-hole', atMm: x, yMm: 0, diameterMm: h.diameterMm, punch: nearestPunch(h.diameterMm), layers: 1, label: i === h.middleHole - 1 ? `hole ${i + 1} (middle)` : `hole ${i + 1}` }));
  }
  features.sort((a, b) => a.atMm - b.atMm || a.yMm - b.yMm);
  for (const f of features) {
    const half = (f.diameterMm ?? f.lengthMm ?? 0) / 2;
    if (f.atMm - half < -1e-6 || f.atMm + half > lengthMm + 1e-6) throw fieldError(spec, `${field}`, `${f.label} at ${len(f.atMm)} lies outside the ${len(lengthMm)} blank`, `within 0 to ${len(lengthMm)}`);
    if (Math.abs(f.yMm) + (f.diameterMm ?? f.widthMm ?? 0) / 2 > profile.at(f.atMm) / 2 + 1e-6)
      throw fieldError(spec, `${field}`, `${f.label} at ${len(f.atMm)} runs off the edge of the ${len(profile.at(f.atMm))} wide leather`, 'within the width');
  }
  const warnings: Warning[] = [];
  const outline = piece.stitchRows.length ? pieceOutline(profile, piece.start.shape, piece.end.shape) : [];
  const stitchRows = piece.stitchRows.flatMap((row, i) => {
    const r = layoutStitchRow(row, profile, outline, lengthMm, `${field}.stitchRows.${i}`, piece.id, spec);
    warnings.push(...r.warnings);
    return r.rows;
  });
  const layout: PieceLayout = {
    id: piece.id,
    name: piece.name,
    role: piece.role,
    count: piece.count,
    blankLengthMm: lengthMm,
    widthMm: profile.maxWidthMm,
    widthStations: profile.stations,
    features,
    folds: [...s.folds, ...e.folds],
    stitchRows,
    shapeDepthMm: { start: profile.x0, end: lengthMm - profile.x1 },
    warnings,
  };
  layout.warnings.push(...pieceWarnings(spec, layout, profile, t, { slotHolder: piece.start.kind === 'fold-over' && !!piece.start.slot }));
  return { layout, profile };
}

/**
 * Computes the full Layout of a validated spec (see {@link parseSpec}). Pure: the spec is not
 * changed. Lengths in mm, positions from each piece's datum. Throws {@link EngineError} on
 * impossible geometry, naming the field and the limit.
 */
export function computeLayout(stored: StrapSpec): PatternLayout {
  // A revision saved before holes were numbered from 1 is read as today's spec.
  const spec = upgradeSpec(stored);
  const t = thicknessMm(spec.thickness);
  const strapIdx = spec.pieces.findIndex((p) => p.role === 'strap');
  if (strapIdx < 0 || spec.pieces.filter((p) => p.role === 'strap').length > 1)
    throw fieldError(spec, 'pieces', 'a pattern needs exactly one strap piece (the one that takes its length from the girth)', 'exactly 1 strap piece');
  const strap = spec.pieces[strapIdx]!;
  if (strap.length.kind !== 'girth') throw fieldError(spec, `pieces.${strapIdx}.length.kind`, 'the strap takes its length from the girth', 'from the girth');
  const others = new Map<number, number>();
  spec.pieces.forEach((p, i) => i !== strapIdx && others.set(i, otherBlankMm(spec, p, t, `pieces.${i}`)));
  let outsideMm = spec.hardware.loopExtraMm;
  spec.pieces.forEach((p, i) => {
    if (p.role !== 'bridge') return;
    const L = others.get(i)!;
    outsideMm += p.count * (L - attachFromEndMm(p.end, t) - attachFromEndMm(p.start, t));
  });
  const parts: LoopParts = { thicknessMm: t, outsideMm };
  const ruleL = strapBlankMm(spec, strap, 'rule', parts, `pieces.${strapIdx}`);
  const fitL = strapBlankMm(spec, strap, 'fit', parts, `pieces.${strapIdx}`);
  const strapL = spec.mode === 'rule' ? ruleL : fitL;
  const laid = spec.pieces.map((p, i) => layoutPiece(spec, p, i, i === strapIdx ? strapL : others.get(i)!, t));
  const strapLayout = laid[strapIdx]!.layout;
  const fit = fitReport(spec, strap, strapL, parts);
  strapLayout.fit = fit;
  const rings = placeDRings(spec, strapLayout, strap.start.kind === 'fold-over');
  if (rings.placements.length) strapLayout.hardware = rings.placements;
  strapLayout.warnings.push(...rings.warnings);
  const pieces = laid.map((l) => l.layout);
  // Clips (swivel snaps, rings) go in the free folds, the strap's first, then the other pieces'.
  const clips = spec.hardware.clips;
  let clipsLeft = clips?.count ?? 0;
  for (const p of clipsLeft > 0 ? [strapLayout, ...pieces.filter((x) => x !== strapLayout)] : []) {
    const placed = ringsInFolds(p, clipsLeft, clips!.kind === 'ring' ? 'ring' : clips!.kind === 'swivel-snap' ? 'swivel snap' : 'trigger snap', clips!.insideWidthMm, 0);
    if (placed.length) p.hardware = [...(p.hardware ?? []), ...placed];
    clipsLeft -= placed.length;
  }
  const keeper = pieces.find((p) => p.role === 'accessory');
  const warnings = [...pieces.flatMap((p) => p.warnings), ...patternWarnings(spec, strapLayout, fit, laid[strapIdx]!.profile, t, keeper?.widthMm ?? 9.5)];
  for (const p of pieces)
    if (p.blankLengthMm > spec.maxStripMm)
      warnings.push({ code: 'blank-longer-than-strip', pieceId: p.id, message: `${p.name}: blank ${formatLength(p.blankLengthMm, spec.units)} is longer than the usual ${formatLength(spec.maxStripMm, spec.units)} strip` });
  const rvf = ruleVsFit(spec, strap, ruleL, fitL, parts);
  return roundLayoutNumbers({
    engineVersion: ENGINE_VERSION,
    kind: spec.kind,
    name: spec.name,
    units: spec.units,
    mode: spec.mode,
    thicknessMm: t,
    girthMm: spec.girthMm,
    targetMm: spec.girthMm + spec.easeMm,
    pieces,
    fit,
    ruleVsFit: rvf,
    cutList: cutList(spec, pieces, t),
    warnings,
  });
}
