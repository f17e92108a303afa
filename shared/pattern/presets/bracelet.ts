import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch } from '../../units/length.ts';

/**
 * Snap bracelet (common practice: blank = wrist + 3/4 to 1 in), 3/4 in, 6 oz, rounded ends
 * that overlap and close with one line-20 snap; ease 1/4 in for comfort (from memory).
 */
export function braceletPreset(): StrapSpec {
  const snap = { fromEndMm: inch(3 / 8), yMm: 0, diameterMm: inch(1 / 8), fastener: 'snap' as const };
  const end = { kind: 'plain' as const, holes: [snap], shape: { kind: 'round' as const } };
  return {
    specVersion: 1,
    sizes: [],
    kind: 'bracelet',
    name: 'Bracelet for Maren Finch',
    units: 'in',
    mode: 'rule',
    girthMm: inch(6.5),
    girthMeasured: 'snug',
    easeMm: inch(0.25),
    closes: true,
    widthMm: inch(0.75),
    thickness: { unit: 'oz', value: 6 },
    edgeGuideMm: inch(3 / 32),
    rule: { measure: 'blank', allowanceMm: inch(1) },
    hardware: {
      buckle: { style: 'none', insideWidthMm: inch(0.75), tongueLengthMm: 0, tongueWireMm: 0 },
      dRings: { count: 0, insideWidthMm: inch(0.75), wireDiameterMm: 3 },
      keepers: 0,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [
      { id: 'strap', name: 'Bracelet', role: 'strap', count: 1, length: { kind: 'girth' }, start: end, end, taper: [], stitchRows: [] },
    ],
  };
}
