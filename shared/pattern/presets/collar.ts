import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch } from '../../units/length.ts';

/**
 * Dog collar, rule mode (common practice): 1 in wide, 10 oz, centre-bar buckle and two
 * D-rings, loose neck 13 in, blank = neck + 8 in. Buckle end from the end: 1/8 in rivet holes
 * at 1 1/2 and 2 1/2 in, a 1 in tongue slot from 3 1/4 to 4 1/4 in, the fold at its middle
 * (3 3/4 in) so the partners land at 6 and 5 in, a single-layer hole at 7 in. Tip: first
 * adjustment hole 3 in from the tip, 3/16 in holes 3/4 in apart, five, the middle nominal.
 */
export function collarPreset(): StrapSpec {
  const rivet = (at: number) => ({ fromEndMm: inch(at), yMm: 0, diameterMm: inch(1 / 8), fastener: 'rivet' as const });
  return {
    specVersion: 1,
    sizes: [],
    kind: 'collar',
    name: 'Collar for Juniper',
    units: 'in',
    mode: 'rule',
    girthMm: inch(13),
    girthMeasured: 'two-fingers',
    // The loose neck measure already holds the two-finger ease (common practice).
    easeMm: 0,
    closes: true,
    widthMm: inch(1),
    thickness: { unit: 'oz', value: 10 },
    edgeGuideMm: inch(1 / 8),
    rule: { measure: 'blank', allowanceMm: inch(8) },
    hardware: {
      buckle: { style: 'centre-bar', insideWidthMm: inch(1), tongueLengthMm: 24, tongueWireMm: 3 },
      dRings: { count: 2, insideWidthMm: inch(1), wireDiameterMm: 4 },
      keepers: 0,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [
      {
        id: 'strap',
        name: 'Collar',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: {
          kind: 'fold-over',
          foldAtMm: inch(3.75),
          barDiameterMm: 3,
          slot: { lengthMm: inch(1), widthMm: inch(3 / 16) },
          flapHoles: [rivet(1.5), rivet(2.5)],
          bodyHoles: [{ ...rivet(7), fastener: 'hole' }],
          shape: { kind: 'square' },
        },
        end: {
          kind: 'adjustable',
          holes: { count: 5, spacingMm: inch(0.75), diameterMm: inch(3 / 16), firstFromTipMm: inch(3), middleHole: 3 },
          shape: { kind: 'english-point', depthMm: inch(0.75) },
        },
        taper: [],
        stitchRows: [],
      },
    ],
  };
}

