import type { StrapSpec } from '../../schemas/strap-spec.ts';

/**
 * Two-piece watch strap, mm (common practice): 20 mm lugs tapering to an 18 mm buckle;
 * regular lengths about 120 mm long / 75 mm short, visible from the spring bar. Each piece
 * folds round its spring bar (1.8 mm); the short piece also folds round the buckle bar
 * through a tongue slot. Both stitched along the edges with a 3.85 mm iron. One keeper, cut
 * here as its own piece.
 */
export function watchStrapPreset(): StrapSpec {
  const lugFold = { kind: 'fold-over' as const, foldAtMm: 12, barDiameterMm: 1.8, slot: null, flapHoles: [], bodyHoles: [], shape: { kind: 'square' as const } };
  const stitch = { path: 'both-edges' as const, offsetMm: 2.5, pitchMm: 3.85, tolerancePct: 6 };
  return {
    specVersion: 1,
    sizes: [],
    kind: 'watch-strap',
    name: 'Watch strap for Ilse Park',
    units: 'mm',
    mode: 'rule',
    girthMm: 165,
    girthMeasured: 'snug',
    easeMm: 12,
    closes: true,
    widthMm: 20,
    thickness: { unit: 'mm', value: 2.8 },
    edgeGuideMm: 2.5,
    rule: { measure: 'fixed', blankMm: 132 },
    hardware: {
      buckle: { style: 'heel-bar', insideWidthMm: 18, tongueLengthMm: 14, tongueWireMm: 1.5 },
      dRings: { count: 0, insideWidthMm: 18, wireDiameterMm: 1.5 },
      keepers: 1,
      // The watch case from spring bar to spring bar (a 40 mm case, common practice).
      loopExtraMm: 46,
    },
    foldK: 0.5,
    maxStripMm: 1524,
    pieces: [
      {
        id: 'long',
        name: 'Long piece',
        role: 'strap',
        count: 1,
        length: { kind: 'girth' },
        start: lugFold,
        end: {
          kind: 'adjustable',
          holes: { count: 7, spacingMm: 6, diameterMm: 2.4, firstFromTipMm: 30, middleHole: 4 },
          shape: { kind: 'round', radiusMm: 9 },
        },
        taper: [
          { atMm: 24, from: 'start', widthMm: 20 },
          { atMm: 40, from: 'end', widthMm: 18 },
        ],
        stitchRows: [{ ...stitch, fromMm: 26, fromRef: 'start', toMm: 12, toRef: 'end' }],
      },
      {
        id: 'short',
        name: 'Short piece',
        role: 'bridge',
        count: 1,
        length: { kind: 'fixed', blankMm: 102 },
        start: { ...lugFold, foldAtMm: 15, barDiameterMm: 2, slot: { lengthMm: 11, widthMm: 2.5 } },
        end: lugFold,
        taper: [
          { atMm: 30, from: 'start', widthMm: 18 },
          { atMm: 24, from: 'end', widthMm: 20 },
        ],
        stitchRows: [{ ...stitch, fromMm: 31, fromRef: 'start', toMm: 26, toRef: 'end' }],
      },
      {
        // The keeper round both pieces' ends where the tail tucks in, butted and glued (from memory).
        id: 'keeper',
        name: 'Keeper',
        role: 'accessory',
        count: 1,
        length: { kind: 'keeper', layers: 2, easeMm: 1, overlapMm: 0 },
        widthMm: 6,
        start: { kind: 'plain', holes: [], shape: { kind: 'square' } },
        end: { kind: 'plain', holes: [], shape: { kind: 'square' } },
        taper: [],
        stitchRows: [],
      },
    ],
  };
}
