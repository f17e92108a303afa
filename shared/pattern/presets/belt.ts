import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch, ozToMm } from '../../units/length.ts';

const WIDTH_IN = 1.5;
const OZ = 9;

/**
 * Casual belt (common practice, TRADE.md): 1 1/2 in wide, 9 oz; size = buckle bar to the
 * middle hole = waist + 2 in; five 3/16 in holes 1 in apart; last hole to tip 2.5 x width
 * (traditional saddlery rule); the buckle end folds round a heel-bar buckle and is held by
 * two Chicago screws so the buckle can be changed; one keeper trapped in the fold.
 */
export function beltPreset(): StrapSpec {
  const screw = (at: number) => ({ fromEndMm: inch(at), yMm: 0, diameterMm: inch(5 / 32), fastener: 'screw' as const });
  return {
    specVersion: 1,
    sizes: [],
    kind: 'belt',
    name: 'Belt for Tobias Harrow',
    units: 'in',
    mode: 'rule',
    girthMm: inch(34),
    girthMeasured: 'snug',
    // Fit mode aims at the belt size (waist + 2 in), so ease mirrors the rule's allowance.
    easeMm: inch(2),
    closes: true,
    widthMm: inch(WIDTH_IN),
    thickness: { unit: 'oz', value: OZ },
    edgeGuideMm: inch(1 / 8),
    rule: { measure: 'nominal-hole', allowanceMm: inch(2) },
    hardware: {
      buckle: { style: 'heel-bar', insideWidthMm: inch(WIDTH_IN), tongueLengthMm: 40, tongueWireMm: 4 },
      dRings: { count: 0, insideWidthMm: inch(WIDTH_IN), wireDiameterMm: 4 },
      keepers: 1,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [
      {
        id: 'strap',
        name: 'Belt',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: {
          kind: 'fold-over',
          foldAtMm: inch(3),
          barDiameterMm: 5,
          slot: { lengthMm: inch(1), widthMm: inch(1 / 4) },
          flapHoles: [screw(0.75), screw(1.75)],
          bodyHoles: [],
          shape: { kind: 'square' },
        },
        end: {
          kind: 'adjustable',
          holes: { count: 5, spacingMm: inch(1), diameterMm: inch(3 / 16), firstFromTipMm: inch(2.5 * WIDTH_IN), middleHole: 3 },
          shape: { kind: 'english-point', depthMm: inch(1) },
        },
        taper: [],
        stitchRows: [],
      },
      {
        id: 'keeper',
        name: 'Keeper',
        role: 'accessory',
        count: 1,
        length: { kind: 'keeper', layers: 2, easeMm: 2, overlapMm: 0 },
        widthMm: inch(3 / 8),
        start: { kind: 'plain', holes: [], shape: { kind: 'square' } },
        end: { kind: 'plain', holes: [], shape: { kind: 'square' } },
        taper: [],
        stitchRows: [],
      },
    ],
  };
}

/** Thickness of the belt preset in mm (9 oz at 1/64 in per oz). */
export const BELT_THICKNESS_MM = ozToMm(OZ);
