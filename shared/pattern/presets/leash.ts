import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch } from '../../units/length.ts';

/**
 * Six-foot leash (common practice: 4 ft and 6 ft), 3/4 in, 8 oz. The start folds back round
 * the snap hook's eye, the end folds back into a hand loop; each fold-back is held by two
 * rivets through the overlap. The 6 ft is the working length from hook to handle.
 * Rule allowance: 12 in for the two loops (from memory).
 */
export function leashPreset(): StrapSpec {
  const rivet = (at: number) => ({ fromEndMm: inch(at), yMm: 0, diameterMm: inch(1 / 8), fastener: 'rivet' as const });
  return {
    specVersion: 1,
    sizes: [],
    kind: 'leash',
    name: 'Leash for Bosun',
    units: 'in',
    mode: 'rule',
    girthMm: inch(72),
    girthMeasured: 'snug',
    easeMm: 0,
    closes: false,
    widthMm: inch(0.75),
    thickness: { unit: 'oz', value: 8 },
    edgeGuideMm: inch(3 / 32),
    rule: { measure: 'blank', allowanceMm: inch(12) },
    hardware: {
      buckle: { style: 'none', insideWidthMm: inch(0.75), tongueLengthMm: 0, tongueWireMm: 0 },
      dRings: { count: 0, insideWidthMm: inch(0.75), wireDiameterMm: 4 },
      keepers: 0,
      loopExtraMm: 0,
    },
    foldK: 0.5,
    maxStripMm: inch(60),
    pieces: [
      {
        id: 'strap',
        name: 'Leash',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: { kind: 'fold-back', loopInnerMm: inch(1.25), overlapMm: inch(1.75), flapHoles: [rivet(0.5), rivet(1.25)], shape: { kind: 'round' } },
        end: { kind: 'fold-back', loopInnerMm: inch(9), overlapMm: inch(2), flapHoles: [rivet(0.5), rivet(1.5)], shape: { kind: 'round' } },
        taper: [],
        stitchRows: [],
      },
    ],
  };
}
