import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch, ozToMm } from '../../units/length.ts';

/**
 * A loose keeper for a 1 1/2 in, 9 oz belt: a 3/8 in strip of 5 oz closed round two layers
 * of the belt, ends butted and stitched. The "girth" is the perimeter of what it holds,
 * 2 x (width + 2 x thickness); 2 mm ease so it slides (from memory).
 */
export function keeperPreset(): StrapSpec {
  const heldWidthMm = inch(1.5);
  const heldThicknessMm = ozToMm(9);
  const plain = { kind: 'plain' as const, holes: [], shape: { kind: 'square' as const } };
  return {
    specVersion: 1,
    sizes: [],
    kind: 'keeper',
    name: 'Keeper for a 1 1/2 in belt',
    units: 'in',
    mode: 'fit',
    girthMm: 2 * (heldWidthMm + 2 * heldThicknessMm),
    girthMeasured: 'snug',
    easeMm: 2,
    closes: true,
    widthMm: inch(3 / 8),
    thickness: { unit: 'oz', value: 5 },
    edgeGuideMm: 2,
    rule: { measure: 'blank', allowanceMm: inch(3 / 8) },
    hardware: {
      buckle: { style: 'none', insideWidthMm: inch(1.5), tongueLengthMm: 0, tongueWireMm: 0 },
      dRings: { count: 0, insideWidthMm: inch(1.5), wireDiameterMm: 3 },
      keepers: 0,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [{ id: 'keeper', name: 'Keeper', role: 'strap', count: 1, length: { kind: 'girth' }, start: plain, end: plain, taper: [], stitchRows: [] }],
  };
}
