import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch } from '../../units/length.ts';

const rivet = (at: number) => ({ fromEndMm: inch(at), yMm: 0, diameterMm: inch(1 / 8), fastener: 'rivet' as const });
/** An end folded round a ring or a clip's eye 2 in from the end, the flap riveted through both layers at 1/2 and 1 1/4 in. */
const foldRound = (barDiameterMm: number) => ({
  kind: 'fold-over' as const,
  foldAtMm: inch(2),
  barDiameterMm,
  slot: null,
  flapHoles: [rivet(0.5), rivet(1.25)],
  bodyHoles: [],
  shape: { kind: 'round' as const },
});

/**
 * Bag or instrument strap (common practice): 1 1/4 in, 7 oz, 48 in from ring to ring. Each end
 * folds round one of the bag's D-rings 2 in from the end, its flap held by two rivets through
 * both layers (each flap hole has a partner mirrored across the fold); both edges stitched
 * between the flaps with a 3.85 mm iron. It does not close round the body, so no thickness
 * correction applies. Rule: blank = length + 4 in, the two 2 in flaps (common practice).
 */
export function bagStrapPreset(): StrapSpec {
  const end = foldRound(4);
  return {
    specVersion: 1,
    sizes: [],
    kind: 'bag-strap',
    name: 'Satchel strap, Harrow & Finch',
    units: 'in',
    mode: 'rule',
    girthMm: inch(48),
    girthMeasured: 'snug',
    easeMm: 0,
    closes: false,
    widthMm: inch(1.25),
    thickness: { unit: 'oz', value: 7 },
    edgeGuideMm: inch(1 / 8),
    rule: { measure: 'blank', allowanceMm: inch(4) },
    hardware: {
      buckle: { style: 'none', insideWidthMm: inch(1.25), tongueLengthMm: 0, tongueWireMm: 0 },
      dRings: { count: 2, insideWidthMm: inch(1.25), wireDiameterMm: 4 },
      keepers: 0,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [
      {
        id: 'strap',
        name: 'Strap',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: end,
        end,
        taper: [],
        stitchRows: [{ path: 'both-edges', fromMm: inch(4.5), fromRef: 'start', toMm: inch(4.5), toRef: 'end', offsetMm: 3.5, pitchMm: 3.85, tolerancePct: 5 }],
      },
    ],
  };
}

/**
 * Adjustable bag or instrument strap (common practice): 1 in, 7 oz, a swivel snap at each end
 * to clip to the bag, adjusted at a centre-bar buckle. The long piece folds round one snap's
 * eye and carries nine holes 1 in apart at its tip; the short piece folds round the buckle
 * (tongue slot at the fold) and round the other snap's eye. The length is measured snap to
 * snap at the middle hole: 44 in, with 4 in of adjustment either way. One keeper.
 */
export function adjustableBagStrapPreset(): StrapSpec {
  const base = bagStrapPreset();
  const snapEye = foldRound(3);
  return {
    ...base,
    name: 'Adjustable guitar strap, Harrow & Finch',
    mode: 'fit',
    girthMm: inch(44),
    widthMm: inch(1),
    rule: { measure: 'nominal-hole', allowanceMm: 0 },
    hardware: {
      buckle: { style: 'centre-bar', insideWidthMm: inch(1), tongueLengthMm: 22, tongueWireMm: 3 },
      dRings: { count: 0, insideWidthMm: inch(1), wireDiameterMm: 4 },
      keepers: 1,
      loopExtraMm: 0,
      clips: { kind: 'swivel-snap', count: 2, insideWidthMm: inch(1) },
    },
    pieces: [
      {
        id: 'long',
        name: 'Long piece',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: snapEye,
        end: {
          kind: 'adjustable',
          holes: { count: 9, spacingMm: inch(1), diameterMm: inch(5 / 32), firstFromTipMm: inch(3), middleHole: 5 },
          shape: { kind: 'english-point', depthMm: inch(0.75) },
        },
        taper: [],
        stitchRows: [{ path: 'both-edges', fromMm: inch(4.5), fromRef: 'start', toMm: inch(12), toRef: 'end', offsetMm: 3.5, pitchMm: 3.85, tolerancePct: 5 }],
      },
      {
        id: 'short',
        name: 'Short piece',
        role: 'bridge',
        count: 1,
        length: { kind: 'fixed', blankMm: inch(10) },
        start: { ...foldRound(3), slot: { lengthMm: inch(1), widthMm: inch(3 / 16) }, flapHoles: [rivet(0.5), rivet(1.25)] },
        end: snapEye,
        taper: [],
        stitchRows: [],
      },
    ],
  };
}
