/**
 * A new pattern from the shop's standard: the built-in preset of that kind with the owner's
 * rule, ease, width, holes, end shapes, stitching and chosen hardware laid over it. Applying
 * the standard read off a preset gives the preset back unchanged (see shop-standard-defaults).
 */
import type { PresetName, StrapSpec } from '../schemas/strap-spec.ts';
import type { HardwareItem, KindStandard, ShopStandards } from '../schemas/shop-standards.ts';
import { presetSpec } from './presets/index.ts';
import { builtInKindStandard } from './shop-standard-defaults.ts';

/** `spec` with `std` laid over it; `hardware` is the shop's list the ids point into. */
export function applyKindStandard(spec: StrapSpec, std: KindStandard, hardware: readonly HardwareItem[]): StrapSpec {
  const out = structuredClone(spec);
  out.rule = structuredClone(std.rule);
  out.easeMm = std.easeMm;
  out.widthMm = std.widthMm;
  out.edgeGuideMm = std.edgeGuideMm;
  const strap = out.pieces.find((p) => p.role === 'strap') ?? out.pieces[0]!;
  strap.start = { ...strap.start, shape: structuredClone(std.buckleEndShape) } as typeof strap.start;
  strap.end = { ...strap.end, shape: structuredClone(std.tipShape) } as typeof strap.end;
  if (std.holes && strap.end.kind === 'adjustable') {
    const h = strap.end.holes;
    // Keep the preset's nominal hole when the count is the same; otherwise the middle one.
    const middleHole = std.holes.count === h.count ? h.middleHole : Math.ceil(std.holes.count / 2);
    strap.end.holes = { ...h, count: std.holes.count, spacingMm: std.holes.spacingMm, diameterMm: std.holes.diameterMm, middleHole };
  }
  for (const piece of out.pieces) for (const row of piece.stitchRows) row.pitchMm = std.stitchPitchMm;

  const buckle = hardware.find((h) => h.id === std.buckleId && h.kind === 'buckle');
  if (buckle && out.hardware.buckle.style !== 'none') {
    const b = out.hardware.buckle;
    out.hardware.buckle = {
      style: buckle.buckleStyle ?? b.style,
      insideWidthMm: buckle.insideWidthMm ?? b.insideWidthMm,
      tongueLengthMm: buckle.tongueLengthMm ?? b.tongueLengthMm,
      tongueWireMm: buckle.tongueWireMm ?? b.tongueWireMm,
    };
  }
  const ring = hardware.find((h) => h.id === std.ringId);
  if (ring && ring.kind !== 'buckle') {
    const d = out.hardware.dRings;
    out.hardware.dRings = { ...d, insideWidthMm: ring.insideWidthMm ?? d.insideWidthMm, wireDiameterMm: ring.wireDiameterMm ?? d.wireDiameterMm };
  }
  return out;
}

/** The spec a new pattern of `kind` starts from in a shop with `standards`. */
export function specFromShopStandard(standards: ShopStandards, kind: PresetName): StrapSpec {
  return applyKindStandard(presetSpec(kind), standards.kinds[kind] ?? builtInKindStandard(kind), standards.hardware);
}
