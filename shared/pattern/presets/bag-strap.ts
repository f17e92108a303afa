import type { StrapSpec } from '../../schemas/strap-spec.ts';
import { inToMm as inch } from '../../units/length.ts';

/**
 * Bag or instrument strap (common practice): 1 1/4 in, 7 oz, 48 in between the screws that
 * hold it to the bag's tabs, two Chicago screws at each rounded end, both edges stitched
 * with a 3.85 mm iron. It does not close round the body, so no thickness correction applies.
 */
export function bagStrapPreset(): StrapSpec {
  const screw = (at: number) => ({ fromEndMm: inch(at), yMm: 0, diameterMm: inch(5 / 32), fastener: 'screw' as const });
  const end = { kind: 'plain' as const, holes: [screw(0.5), screw(1.25)], shape: { kind: 'round' as const } };
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
    rule: { measure: 'blank', allowanceMm: inch(2.5) },
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
        stitchRows: [
          { path: 'both-edges', fromMm: inch(2), fromRef: 'start', toMm: inch(2), toRef: 'end', offsetMm: 3.5, pitchMm: 3.85, tolerancePct: 5 },
        ],
      },
    ],
  };
}
