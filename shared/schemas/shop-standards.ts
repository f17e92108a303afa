/**
 * The shop's standards, set by its owners and read by everyone in the shop: per kind of
 * strap the length rule, ease, holes, end shapes and stitching a new pattern starts from; the
 * hardware the shop stocks (with unit costs for pricing); and the punches on its bench.
 * All lengths are millimetres; `units` is only how the Shop page shows them.
 * One schema for the Shop page's form and for `PUT /api/shop/standards`.
 */
import { z } from 'zod';
import { EndShapeSchema, LengthRuleSchema, PRESET_NAMES } from './strap-spec.ts';
import * as L from './strap-spec-limits.ts';

// Messages name the field as the Shop page labels it; the client restates the limit in the
// unit the owner sees (see `standardsMessage` in the standards screen).
const mm = (label: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number` })
    .min(min, { error: `${label} must be at least ${min} mm` })
    .max(max, { error: `${label} must be at most ${max} mm` });
const whole = (label: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a whole number` })
    .int({ error: `${label} must be a whole number` })
    .min(min, { error: `${label} must be at least ${min}` })
    .max(max, { error: `${label} must be at most ${max}` });
const text = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text` })
    .trim()
    .min(1, { error: `${label} must not be empty` })
    .max(max, { error: `${label} must be at most ${max} characters` });

/** Ids the client makes up for list rows (hardware, punches): short, lower-case. */
export const StandardItemIdSchema = z.string().regex(/^[a-z0-9][a-z0-9-]{0,39}$/, { error: 'Each item needs a short id of lower-case letters, digits and dashes' });

/** What a piece of hardware is. */
export const HARDWARE_KINDS = ['buckle', 'd-ring', 'ring', 'snap', 'swivel', 'slider', 'rivet', 'other'] as const;
/** One of {@link HARDWARE_KINDS}. */
export type HardwareKind = (typeof HARDWARE_KINDS)[number];
/** The kinds in words, as the Shop page's hardware list and the order forms name them. */
export const HARDWARE_KIND_LABELS: Record<HardwareKind, string> = {
  buckle: 'Buckle',
  'd-ring': 'D-ring',
  ring: 'Ring',
  snap: 'Snap',
  swivel: 'Swivel snap',
  slider: 'Slider',
  rivet: 'Rivet',
  other: 'Other',
};

/**
 * One item of hardware the shop stocks. Buckles by inside width and tongue, rings and
 * sliders by inside width and wire, rivets by post length. `unitCostCents` is an integer in
 * the shop's currency (pricing reads it).
 */
export const HardwareItemSchema = z.object({
  id: StandardItemIdSchema,
  kind: z.enum(HARDWARE_KINDS, { error: 'Hardware type must be one of buckle, D-ring, ring, snap, swivel, slider, rivet, other' }),
  name: text('Hardware name', 80),
  /** Inside width: the widest strap that passes (buckles, D-rings, rings, sliders, swivels). */
  insideWidthMm: mm('Inside width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM).optional(),
  /** Buckles: the tongue's length from the bar. */
  tongueLengthMm: mm('Tongue length', 0, 100).optional(),
  /** Buckles: the tongue wire's thickness (the tongue slot must pass it). */
  tongueWireMm: mm('Tongue wire', 0, 10).optional(),
  /** Buckles: the frame. */
  buckleStyle: z.enum(['centre-bar', 'heel-bar', 'roller', 'tongue-less'], { error: 'Buckle style must be centre bar, heel bar, roller or tongueless' }).optional(),
  /** Rings, D-rings, sliders: the wire or bar the leather wraps. */
  wireDiameterMm: mm('Wire thickness', 0.5, 20).optional(),
  /** Rivets and snaps: the post's length (the leather it holds must be a little thinner). */
  postLengthMm: mm('Post length', 1, 30).optional(),
  unitCostCents: whole('Unit cost', 0, 100_000_000),
});
/** One item of the shop's hardware. */
export type HardwareItem = z.infer<typeof HardwareItemSchema>;

/** A punch on the shop's bench: its cutting diameter and the number stamped on it. */
export const PunchSchema = z.object({
  id: StandardItemIdSchema,
  diameterMm: mm('Punch diameter', L.HOLE_DIAMETER_MIN_MM, L.HOLE_DIAMETER_MAX_MM),
  /** The maker's size number ("#6", "8"), as stamped; free text. */
  number: z.string().trim().max(12, { error: 'Punch number must be at most 12 characters' }).default(''),
  /** Round hole, oblong (slot) punch, or other. */
  shape: z.enum(['round', 'oblong', 'other']).default('round'),
});
/** A punch. */
export type Punch = z.infer<typeof PunchSchema>;

/**
 * What a new pattern of one kind starts from. `holes` is null for kinds without adjustment
 * holes; `buckleId` / `ringId` point into the shop's hardware (null: keep the preset's).
 */
export const KindStandardSchema = z.object({
  rule: LengthRuleSchema,
  easeMm: mm('Ease', L.EASE_MIN_MM, L.EASE_MAX_MM),
  widthMm: mm('Width', L.WIDTH_MIN_MM, L.WIDTH_MAX_MM),
  holes: z
    .object({
      count: whole('Number of holes', L.HOLE_COUNT_MIN, L.HOLE_COUNT_MAX),
      spacingMm: mm('Hole spacing', L.HOLE_SPACING_MIN_MM, L.HOLE_SPACING_MAX_MM),
      diameterMm: mm('Hole size', L.HOLE_DIAMETER_MIN_MM, L.HOLE_DIAMETER_MAX_MM),
    })
    .nullable(),
  buckleEndShape: EndShapeSchema,
  tipShape: EndShapeSchema,
  stitchPitchMm: mm('Stitch pitch', L.PITCH_MIN_MM, L.PITCH_MAX_MM),
  edgeGuideMm: mm('Edge guide', 0, 20),
  buckleId: StandardItemIdSchema.nullable().default(null),
  ringId: StandardItemIdSchema.nullable().default(null),
});
/** One kind's standard. */
export type KindStandard = z.infer<typeof KindStandardSchema>;

const uniqueIds = (items: Array<{ id: string }>) => new Set(items.map((i) => i.id)).size === items.length;

/** The whole document stored per shop (table shop_standards). */
export const ShopStandardsSchema = z
  .object({
    version: z.literal(1).default(1),
    /** How the Shop page shows lengths. */
    units: z.enum(['in', 'mm']).default('in'),
    /** Kinds the owner has set; a kind left out starts from the built-in preset. */
    kinds: z.partialRecord(z.enum(PRESET_NAMES), KindStandardSchema).default({}),
    hardware: z.array(HardwareItemSchema).max(200, { error: 'The hardware list holds at most 200 items' }).refine(uniqueIds, { error: 'Two hardware items share an id' }).default([]),
    punches: z.array(PunchSchema).max(60, { error: 'The punch list holds at most 60 punches' }).refine(uniqueIds, { error: 'Two punches share an id' }).default([]),
  })
  .superRefine((doc, ctx) => {
    // A kind may only point at hardware the list holds, of a fitting type.
    const byId = new Map(doc.hardware.map((h) => [h.id, h]));
    for (const [kind, std] of Object.entries(doc.kinds)) {
      if (!std) continue;
      const buckle = std.buckleId === null ? undefined : byId.get(std.buckleId);
      if (std.buckleId !== null && buckle?.kind !== 'buckle') ctx.addIssue({ code: 'custom', path: ['kinds', kind, 'buckleId'], message: 'Buckle must be a buckle from the shop’s hardware list' });
      const ring = std.ringId === null ? undefined : byId.get(std.ringId);
      if (std.ringId !== null && !(ring && ['d-ring', 'ring', 'slider', 'swivel'].includes(ring.kind)))
        ctx.addIssue({ code: 'custom', path: ['kinds', kind, 'ringId'], message: 'Ring must be a D-ring, ring, slider or swivel from the shop’s hardware list' });
    }
  });
/** The shop's standards, defaults filled in. */
export type ShopStandards = z.infer<typeof ShopStandardsSchema>;
/** What the form and the PUT body may leave out (defaults fill it). */
export type ShopStandardsInput = z.input<typeof ShopStandardsSchema>;

/** `GET /api/shop/standards` and the PUT's answer. */
export interface ShopStandardsView {
  standards: ShopStandards;
  /** ISO 8601, or null while the shop still uses the built-in defaults. */
  updatedAt: string | null;
  updatedBy: { id: number; name: string } | null;
}
