/**
 * The built-in shop standards: what a shop has before its owner sets anything. Each kind's
 * standard is read off the built-in preset, so a pattern started from the defaults is the
 * preset itself (and opens with no changes). The starter hardware and punches are common
 * stock, unpriced (unit cost 0) until the owner enters the shop's own costs.
 */
import { PRESET_NAMES, type PresetName, type StrapSpec } from '../schemas/strap-spec.ts';
import type { HardwareItem, KindStandard, Punch, ShopStandards } from '../schemas/shop-standards.ts';
import { inToMm as inch } from '../units/length.ts';
import { presetSpec } from './presets/index.ts';
import { punchDiameterMm } from './punch.ts';

/** Pitch of a common pricking iron (3.85 mm) when a preset has no stitch row to read it from. */
export const DEFAULT_STITCH_PITCH_MM = 3.85;

/** One kind's standard as the built-in preset has it. */
export function kindStandardFromSpec(spec: StrapSpec): KindStandard {
  const strap = spec.pieces.find((p) => p.role === 'strap') ?? spec.pieces[0]!;
  const row = spec.pieces.flatMap((p) => p.stitchRows)[0];
  return {
    rule: structuredClone(spec.rule),
    easeMm: spec.easeMm,
    widthMm: spec.widthMm,
    holes: strap.end.kind === 'adjustable' ? { count: strap.end.holes.count, spacingMm: strap.end.holes.spacingMm, diameterMm: strap.end.holes.diameterMm } : null,
    buckleEndShape: structuredClone(strap.start.shape),
    tipShape: structuredClone(strap.end.shape),
    stitchPitchMm: row?.pitchMm ?? DEFAULT_STITCH_PITCH_MM,
    edgeGuideMm: spec.edgeGuideMm,
    buckleId: null,
    ringId: null,
  };
}

/** The built-in standard of one kind. */
export const builtInKindStandard = (kind: PresetName): KindStandard => kindStandardFromSpec(presetSpec(kind));

/** Starter hardware: the buckles and rings the presets are drawn for, and common fixings. */
export function starterHardware(): HardwareItem[] {
  return [
    { id: 'buckle-1in-centre', kind: 'buckle', name: '1 in centre-bar buckle', insideWidthMm: inch(1), tongueLengthMm: 24, tongueWireMm: 3, buckleStyle: 'centre-bar', unitCostCents: 0 },
    { id: 'buckle-1-1-2in-heel', kind: 'buckle', name: '1 1/2 in heel-bar buckle', insideWidthMm: inch(1.5), tongueLengthMm: 40, tongueWireMm: 4, buckleStyle: 'heel-bar', unitCostCents: 0 },
    { id: 'buckle-18mm-watch', kind: 'buckle', name: '18 mm watch buckle', insideWidthMm: 18, tongueLengthMm: 14, tongueWireMm: 1.5, buckleStyle: 'heel-bar', unitCostCents: 0 },
    { id: 'd-ring-1in', kind: 'd-ring', name: '1 in D-ring', insideWidthMm: inch(1), wireDiameterMm: 4, unitCostCents: 0 },
    { id: 'd-ring-1-1-4in', kind: 'd-ring', name: '1 1/4 in D-ring', insideWidthMm: inch(1.25), wireDiameterMm: 4, unitCostCents: 0 },
    { id: 'swivel-3-4in', kind: 'swivel', name: '3/4 in swivel snap', insideWidthMm: inch(0.75), wireDiameterMm: 4, unitCostCents: 0 },
    { id: 'snap-line-24', kind: 'snap', name: 'Line 24 snap', postLengthMm: 6, unitCostCents: 0 },
    { id: 'rivet-double-cap-medium', kind: 'rivet', name: 'Double-cap rivet, medium post', postLengthMm: 8, unitCostCents: 0 },
  ];
}

/** Starter punches: round drive punches #0 to #10 (see punch.ts for the numbering). */
export function starterPunches(): Punch[] {
  return Array.from({ length: 11 }, (_, n) => ({ id: `round-${n}`, diameterMm: Math.round(punchDiameterMm(n) * 1e6) / 1e6, number: `#${n}`, shape: 'round' as const }));
}

/** The whole built-in document: every kind from its preset, starter hardware and punches. */
export function builtInShopStandards(): ShopStandards {
  const kinds: ShopStandards['kinds'] = {};
  for (const k of PRESET_NAMES) kinds[k] = builtInKindStandard(k);
  return { version: 1, units: 'in', kinds, hardware: starterHardware(), punches: starterPunches() };
}

/** A saved document with every kind it leaves out filled from the presets (kinds added later too). */
export function withBuiltInKinds(doc: ShopStandards): ShopStandards {
  const kinds: ShopStandards['kinds'] = { ...doc.kinds };
  for (const k of PRESET_NAMES) kinds[k] ??= builtInKindStandard(k);
  return { ...doc, kinds };
}
