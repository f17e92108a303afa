import { z } from 'zod';
import * as L from './strap-spec-limits.ts';

export * from './strap-spec-limits.ts';

/** How a girth was measured: tape snug on the body, or loose over two fingers laid flat. */
export const GIRTH_MEASURED = ['snug', 'two-fingers'] as const;

/** Strap kinds with a preset (see shared/pattern/presets). */
export const PRESET_NAMES = ['collar', 'belt', 'watch-strap', 'bag-strap', 'leash', 'bracelet', 'keeper'] as const;
/** One of {@link PRESET_NAMES}. */
export type PresetName = (typeof PRESET_NAMES)[number];

// zod 4 numbers already refuse NaN and Infinity; every message names the limit.
const mm = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number of mm` })
    .min(min, { error: `${what} must be at least ${min} mm` })
    .max(max, { error: `${what} must be at most ${max} mm` });
const count = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a whole number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` })
    .max(max, { error: `${what} must be at most ${max}` });

/** End outline shapes; each parameter in mm. */
export const EndShapeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('square') }),
  /** Rounded corners of radius `radiusMm`; half the width gives a semicircle. */
  z.object({ kind: z.literal('round'), radiusMm: mm('radius', 0.5, L.WIDTH_MAX_MM / 2).optional() }),
  /** Two 45° corner chamfers, each `chamferMm` along both edges. */
  z.object({ kind: z.literal('clipped'), chamferMm: mm('chamfer', 0.5, L.WIDTH_MAX_MM / 2) }),
  /** Two convex arcs, tangent to the edges, meeting on the centreline `depthMm` beyond where they start. */
  z.object({ kind: z.literal('english-point'), depthMm: mm('point depth', 1, 300) }),
  /** A straight V, `depthMm` long. */
  z.object({ kind: z.literal('spear'), depthMm: mm('point depth', 1, 300) }),
]);
/** Outline shape of one end of a piece. */
export type EndShape = z.infer<typeof EndShapeSchema>;

/** What goes through a hole; decides edge distances, punch choice and the cut list. */
export const FastenerSchema = z.enum(['rivet', 'screw', 'snap', 'stitch', 'hole']);

/** A hole placed from its own end of the piece (mm), optionally off the centreline (y, +down). */
export const EndHoleSchema = z.object({
  fromEndMm: mm('hole position', 0, L.BLANK_MAX_MM),
  yMm: mm('hole offset across', -L.WIDTH_MAX_MM / 2, L.WIDTH_MAX_MM / 2).default(0),
  diameterMm: mm('hole diameter', L.HOLE_DIAMETER_MIN_MM, L.HOLE_DIAMETER_MAX_MM),
  fastener: FastenerSchema.default('rivet'),
});

/** Construction of one end of a piece. Positions are measured from that end. */
export const EndSchema = z.discriminatedUnion('kind', [
  /**
   * Folded round a bar (buckle, D-ring, spring bar) at `foldAtMm` from the end. `flapHoles`
   * lie on the folded-back flap and each gets a partner mirrored across the fold;
   * `bodyHoles` go through the body only (one layer) unless a flap hole lands on them.
   */
  z.object({
    kind: z.literal('fold-over'),
    foldAtMm: mm('fold position', 5, 500),
    /** Diameter of the bar the leather wraps (buckle bar, D-ring wire, spring bar). */
    barDiameterMm: mm('bar diameter', 0.5, 20),
    slot: z
      .object({ lengthMm: mm('slot length', 2, 150), widthMm: mm('slot width', 1, 40) })
      .nullable()
      .default(null),
    flapHoles: z.array(EndHoleSchema).max(L.FEATURES_MAX).default([]),
    bodyHoles: z.array(EndHoleSchema).max(L.FEATURES_MAX).default([]),
    shape: EndShapeSchema.default({ kind: 'square' }),
  }),
  /**
   * Adjustment holes for a buckle tongue, numbered from 1 at the buckle end as every table,
   * drawing and PDF numbers them. `middleHole` is the hole the strap fits the girth at.
   * Specs saved before it existed carry `nominalIndex` (the same hole counted from 0); they
   * are read as `middleHole = nominalIndex + 1`. Neither given: the middle of the row.
   */
  z.object({
    kind: z.literal('adjustable'),
    holes: z
      .object({
        count: count('hole count', L.HOLE_COUNT_MIN, L.HOLE_COUNT_MAX),
        spacingMm: mm('hole spacing', L.HOLE_SPACING_MIN_MM, L.HOLE_SPACING_MAX_MM),
        diameterMm: mm('hole diameter', L.HOLE_DIAMETER_MIN_MM, L.HOLE_DIAMETER_MAX_MM),
        firstFromTipMm: mm('first hole from the tip', 3, 1000),
        middleHole: count('middle hole', 1, L.HOLE_COUNT_MAX).optional(),
        /** @deprecated read only, from specs saved before holes were numbered from 1. */
        nominalIndex: count('middle hole', 0, L.HOLE_COUNT_MAX - 1).optional(),
      })
      .transform(({ nominalIndex, middleHole, ...h }) => ({ ...h, middleHole: middleHole ?? (nominalIndex !== undefined ? nominalIndex + 1 : Math.ceil(h.count / 2)) })),
    shape: EndShapeSchema.default({ kind: 'english-point', depthMm: 19 }),
  }),
  /** A plain end with holes for screws, snaps or rivets. */
  z.object({
    kind: z.literal('plain'),
    holes: z.array(EndHoleSchema).max(L.FEATURES_MAX).default([]),
    shape: EndShapeSchema.default({ kind: 'square' }),
  }),
  /**
   * The end folded back on the strap to make a loop (leash handle, hardware loop): a loop of
   * `loopInnerMm` inner circumference, closed by `overlapMm` of flap riveted or stitched down.
   */
  z.object({
    kind: z.literal('fold-back'),
    loopInnerMm: mm('loop inner length', 5, 800),
    overlapMm: mm('loop overlap', 5, 300),
    flapHoles: z.array(EndHoleSchema).max(L.FEATURES_MAX).default([]),
    shape: EndShapeSchema.default({ kind: 'square' }),
  }),
]);
/** One end's construction. */
export type EndSpec = z.infer<typeof EndSchema>;

/** A width station: the piece is `widthMm` wide at `atMm` from the given end; linear between stations. */
export const TaperStationSchema = z.object({
  atMm: mm('taper station', 0, L.BLANK_MAX_MM),
  from: z.enum(['start', 'end']).default('start'),
  widthMm: mm('width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
});

/** A stitch row `offsetMm` in from the edge between two stations, with the pricking iron's pitch. */
export const StitchRowSchema = z.object({
  path: z.enum(['both-edges', 'top-edge', 'bottom-edge', 'around-start', 'around-end']),
  fromMm: mm('stitch row start', 0, L.BLANK_MAX_MM),
  fromRef: z.enum(['start', 'end']).default('start'),
  toMm: mm('stitch row end', 0, L.BLANK_MAX_MM),
  toRef: z.enum(['start', 'end']).default('start'),
  offsetMm: mm('stitch offset', 1, 20),
  pitchMm: mm('stitch pitch', L.PITCH_MIN_MM, L.PITCH_MAX_MM),
  tolerancePct: z.number().min(0, { error: 'pitch tolerance must be at least 0 %' }).max(25, { error: 'pitch tolerance must be at most 25 %' }).default(5),
});

/**
 * How a piece's blank length is found: `girth` (the strap that closes round the body or sets
 * the working length), `fixed` (a given blank), or `keeper` (a loop round `layers` of the strap).
 */
export const PieceLengthSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('girth') }),
  z.object({ kind: z.literal('fixed'), blankMm: mm('blank length', 10, L.BLANK_MAX_MM) }),
  z.object({
    kind: z.literal('keeper'),
    layers: count('keeper layers', 1, 4),
    easeMm: mm('keeper ease', 0, 20),
    overlapMm: mm('keeper overlap', 0, 60),
  }),
]);

/**
 * One blank. `role`: `strap` carries the girth (exactly one per pattern), `bridge` sits in the
 * closed loop between the buckle and the strap (a watch strap's short piece), `accessory` is
 * outside it (a keeper).
 */
export const PieceSpecSchema = z.object({
  id: z.string().regex(/^[a-z][a-z0-9-]{0,31}$/, { error: 'piece id must be lower-case letters, digits and dashes' }),
  name: z.string().min(1, { error: 'piece name must not be empty' }).max(L.NAME_MAX_CHARS, { error: `piece name must be at most ${L.NAME_MAX_CHARS} characters` }),
  role: z.enum(['strap', 'bridge', 'accessory']),
  count: count('piece count', 1, 20).default(1),
  length: PieceLengthSchema,
  widthMm: mm('width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM).optional(),
  start: EndSchema,
  end: EndSchema,
  taper: z.array(TaperStationSchema).max(L.TAPER_STATIONS_MAX).default([]),
  stitchRows: z.array(StitchRowSchema).max(L.STITCH_ROWS_MAX).default([]),
});
/** One piece of a pattern. */
export type PieceSpec = z.infer<typeof PieceSpecSchema>;

/** Buckle, rings and fixings, in mm. */
export const HardwareSchema = z.object({
  buckle: z.object({
    style: z.enum(['centre-bar', 'heel-bar', 'roller', 'tongue-less', 'none']),
    insideWidthMm: mm('buckle inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
    tongueLengthMm: mm('tongue length', 0, 100),
    tongueWireMm: mm('tongue wire', 0, 10),
  }),
  dRings: z.object({
    count: count('D-ring count', 0, 6),
    insideWidthMm: mm('D-ring inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
    wireDiameterMm: mm('D-ring wire', 0.5, 15),
  }),
  keepers: count('keeper count', 0, 4),
  /**
   * Snaps, swivels or rings the strap's end folds wrap (a bag or instrument strap's clips):
   * one at each fold that holds no buckle, up to `count`.
   */
  clips: z
    .object({
      kind: z.enum(['swivel-snap', 'trigger-snap', 'ring']),
      count: count('clip count', 0, 4),
      insideWidthMm: mm('clip eye inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
    })
    .optional(),
  /** Fixed length in the closed loop that is not leather, e.g. a watch case from spring bar to spring bar. */
  loopExtraMm: mm('loop extra', 0, 300).default(0),
});

/**
 * The trade's rule of thumb for the strap piece's length: `blank` = girth + allowance;
 * `nominal-hole` = bar to nominal hole = girth + allowance; `fixed` = a stock blank length.
 */
export const LengthRuleSchema = z.discriminatedUnion('measure', [
  z.object({ measure: z.literal('blank'), allowanceMm: mm('rule allowance', -500, 1000) }),
  z.object({ measure: z.literal('nominal-hole'), allowanceMm: mm('rule allowance', -500, 1000) }),
  z.object({ measure: z.literal('fixed'), blankMm: mm('rule blank length', 10, L.BLANK_MAX_MM) }),
]);

/**
 * One named size of a run: the same pattern at another girth. A size may grade the width,
 * the tip holes and the hardware; what it leaves out comes from the pattern (see specAtGirth).
 */
export const SizeSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, { error: 'size name must not be empty' })
    .max(L.SIZE_NAME_MAX_CHARS, { error: `size name must be at most ${L.SIZE_NAME_MAX_CHARS} characters` }),
  girthMm: mm('size girth', L.GIRTH_MIN_MM, L.GIRTH_MAX_MM),
  /** Strap width of this size; pieces and taper stations scale with it. */
  widthMm: mm('size width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM).optional(),
  /** Tip holes of this size (the strap piece's adjustable end). */
  holes: z
    .object({
      count: count('size hole count', L.HOLE_COUNT_MIN, L.HOLE_COUNT_MAX).optional(),
      spacingMm: mm('size hole spacing', L.HOLE_SPACING_MIN_MM, L.HOLE_SPACING_MAX_MM).optional(),
    })
    .optional(),
  /** Hardware of this size; without it the buckle and D-rings follow the size's width. */
  hardware: z
    .object({
      buckleInsideWidthMm: mm('size buckle inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM).optional(),
      dRingInsideWidthMm: mm('size D-ring inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM).optional(),
    })
    .optional(),
});
/** One named size. */
export type SizeSpec = z.infer<typeof SizeSchema>;

/** The whole pattern as a maker specifies it. Stored as JSON, validated by forms, routes and the CLI. */
export const StrapSpecSchema = z.object({
  specVersion: z.literal(1),
  kind: z.enum(PRESET_NAMES),
  name: z.string().max(L.NAME_MAX_CHARS, { error: `name must be at most ${L.NAME_MAX_CHARS} characters` }).default(''),
  units: z.enum(['in', 'mm']),
  mode: z.enum(['rule', 'fit']),
  /** Measured girth (neck, waist, wrist), or the working length for straps that do not close. */
  girthMm: mm('girth', L.GIRTH_MIN_MM, L.GIRTH_MAX_MM),
  /**
   * How the girth was taken: `snug` (tape flat on the body, nothing under it) or `two-fingers`
   * (tape loose over two fingers laid flat, as collars are measured). Decides how tight a
   * collar may close (checks.ts). Specs saved before it existed read as `snug`.
   */
  girthMeasured: z.enum(GIRTH_MEASURED).default('snug'),
  easeMm: mm('ease', L.EASE_MIN_MM, L.EASE_MAX_MM),
  /** Whether the strap closes into a loop round the body (thickness correction applies). */
  closes: z.boolean(),
  widthMm: mm('width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
  thickness: z.discriminatedUnion('unit', [
    z.object({ unit: z.literal('oz'), value: z.number({ error: 'thickness must be a number' }).min(L.THICKNESS_MIN_OZ, { error: `thickness must be at least ${L.THICKNESS_MIN_OZ} oz` }).max(L.THICKNESS_MAX_OZ, { error: `thickness must be at most ${L.THICKNESS_MAX_OZ} oz` }) }),
    z.object({ unit: z.literal('mm'), value: mm('thickness', L.THICKNESS_MIN_MM, L.THICKNESS_MAX_MM) }),
  ]),
  /** Edge guide: the line a wing divider scribes, this far in from the edge. */
  edgeGuideMm: mm('edge guide', 0, 20),
  rule: LengthRuleSchema,
  hardware: HardwareSchema,
  /** Bend allowance K factor for folds (neutral axis at K x T from the inside face). */
  foldK: z.number().min(0, { error: 'fold K must be at least 0' }).max(1, { error: 'fold K must be at most 1' }).default(0.5),
  /** Longest strip the shop usually cuts from; longer blanks get a warning. */
  maxStripMm: mm('usual strip length', 100, L.BLANK_MAX_MM).default(1524),
  pieces: z.array(PieceSpecSchema).min(1, { error: 'a pattern needs at least 1 piece' }).max(L.PIECES_MAX, { error: `a pattern has at most ${L.PIECES_MAX} pieces` }),
  /** Optional size run graded from this pattern (printed with `size=NAME` or `size=all`). */
  sizes: z
    .array(SizeSchema)
    .max(L.SIZES_MAX, { error: `a size run has at most ${L.SIZES_MAX} sizes` })
    .refine((a) => new Set(a.map((x) => x.name.toLowerCase())).size === a.length, { error: 'size names must be unique' })
    .default([]),
});

/** A validated strap spec (all lengths in mm; `units` is only the display unit). */
export type StrapSpec = z.infer<typeof StrapSpecSchema>;
/** What the schema accepts before defaults are filled in (for forms). */
export type StrapSpecInput = z.input<typeof StrapSpecSchema>;
