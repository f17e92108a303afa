/**
 * Request bodies of the orders and customers API (customers, wearers, measurements, orders,
 * stages, measurement requests, proofs, photos, shop pricing). The client's forms validate
 * with the same schemas. Every limit is an exported constant; every message names the field
 * by the label the form shows. Lengths are mm; a `unit` says how the person typed them, and
 * length messages are written in that unit.
 */
import { z } from 'zod';
import { EMAIL_MAX_CHARS } from './auth.ts';
import { PRESET_NAMES, type PresetName } from './strap-spec.ts';
import { MEASURE_KINDS, formatGirth, type GirthUnit } from './measure-kinds.ts';

export * from './measure-kinds.ts';

// ---- limits ----
export const CUSTOMER_NAME_MAX_CHARS = 100;
export const PHONE_MAX_CHARS = 40;
export const NOTES_MAX_CHARS = 2000;
export const WEARER_NAME_MAX_CHARS = 60;
export const ORDER_QUANTITY_MAX = 50;
export const ORDER_TEXT_MAX_CHARS = 80;
export const BENCH_MINUTES_MAX = 60 * 40;
export const SEARCH_MAX_CHARS = 100;
export const ORDER_LIST_LIMIT_MAX = 500;
export const CHANGE_MESSAGE_MAX_CHARS = 2000;
export const CAPTION_MAX_CHARS = 200;
/** Pricing: waste factor is a multiplier on the blank area (1.3 = 30 % more leather bought than cut). */
export const WASTE_FACTOR_MIN = 1;
export const WASTE_FACTOR_MAX = 3;
export const PRICE_CENTS_MAX = 100_000_00;
export const LEATHERS_MAX = 30;

// ---- small builders: human messages with the form's labels ----
const text = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, { error: `${label} must be at most ${max} characters` });
const required = (label: string, max: number) => text(label, max).min(1, { error: `${label} is required` });
const whole = (label: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${label} must be a whole number` })
    .int({ error: `${label} must be a whole number` })
    .min(min, { error: `${label} must be at least ${min}` })
    .max(max, { error: `${label} must be at most ${max}` });
const id = (label: string) => whole(label, 1, Number.MAX_SAFE_INTEGER);
/** A calendar day, YYYY-MM-DD (due dates have no time of day). */
const day = (label: string) =>
  z
    .string({ error: `${label} is required` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, { error: `${label} must be a date such as 2027-03-14` })
    .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), { error: `${label} must be a real date` });

// ---- customers and wearers ----
const customerFields = {
  name: required('Customer name', CUSTOMER_NAME_MAX_CHARS),
  /** Empty, or an address (trimmed, lower-cased). */
  email: z
    .string({ error: 'E-mail must be text' })
    .trim()
    .toLowerCase()
    .max(EMAIL_MAX_CHARS, { error: `E-mail must be at most ${EMAIL_MAX_CHARS} characters` })
    .refine((s) => s === '' || z.email().safeParse(s).success, { error: 'E-mail must be an e-mail address such as maren@example.com' }),
  phone: text('Phone', PHONE_MAX_CHARS),
  notes: text('Notes', NOTES_MAX_CHARS),
};
/** `POST /api/customers`. */
export const CustomerSchema = z.object({ ...customerFields, email: customerFields.email.default(''), phone: customerFields.phone.default(''), notes: customerFields.notes.default('') });
export type CustomerInput = z.input<typeof CustomerSchema>;
/** `PATCH /api/customers/:id`: any field of {@link CustomerSchema}; absent fields stay as they are. */
export const UpdateCustomerSchema = z.object(customerFields).partial();

/** What a wearer is: the measuring page's wording depends on it. */
export const WEARER_KINDS = ['dog', 'cat', 'horse', 'person', 'other'] as const;
export type WearerKind = (typeof WEARER_KINDS)[number];
export const WEARER_KIND_LABELS: Record<WearerKind, string> = { dog: 'Dog', cat: 'Cat', horse: 'Horse', person: 'Person', other: 'Other' };
const wearerFields = {
  name: required('Wearer name', WEARER_NAME_MAX_CHARS),
  kind: z.enum(WEARER_KINDS, { error: `Wearer must be one of ${WEARER_KINDS.join(', ')}` }),
  notes: text('Notes', NOTES_MAX_CHARS),
};
/** `POST /api/customers/:id/wearers`. */
export const WearerSchema = z.object({ ...wearerFields, notes: wearerFields.notes.default('') });
export type WearerInput = z.input<typeof WearerSchema>;
/** `PATCH /api/wearers/:wearerId`. */
export const UpdateWearerSchema = z.object(wearerFields).partial();

// ---- measurements ----
/** Where on the body a girth was taken. */
export const BODY_PARTS = ['neck', 'chest', 'waist', 'wrist', 'other'] as const;
export type BodyPart = (typeof BODY_PARTS)[number];
export const BODY_PART_LABELS: Record<BodyPart, string> = { neck: 'Neck', chest: 'Chest', waist: 'Waist', wrist: 'Wrist', other: 'Other' };
/** The body part an order of each pattern kind reads its girth from ('other' = any). */
export const PART_FOR_KIND: Record<PresetName, BodyPart> = {
  collar: 'neck',
  belt: 'waist',
  'watch-strap': 'wrist',
  bracelet: 'wrist',
  'bag-strap': 'other',
  leash: 'other',
  keeper: 'other',
};
/** How a girth was taken. */
export const MEASURE_METHODS = ['soft-tape', 'string-and-ruler', 'worn-strap', 'estimate'] as const;
export type MeasureMethod = (typeof MEASURE_METHODS)[number];
export const MEASURE_METHOD_LABELS: Record<MeasureMethod, string> = {
  'soft-tape': 'Soft tape measure',
  'string-and-ruler': 'String and a ruler',
  'worn-strap': 'From a strap that fits',
  estimate: 'Estimate',
};
export const GirthUnitSchema = z.enum(['in', 'cm', 'mm'], { error: 'Unit must be in, cm or mm' });

/** `POST /api/wearers/:id/measurements` (a member measured at the bench). */
export const MeasurementSchema = z
  .object({
    girthMm: z.number({ error: 'Girth must be a number' }),
    unit: GirthUnitSchema.default('in'),
    part: z.enum(BODY_PARTS, { error: `Measured at must be one of ${BODY_PARTS.join(', ')}` }),
    method: z.enum(MEASURE_METHODS, { error: 'How it was measured must be one of the listed ways' }),
    /** When it was taken (ISO 8601); default now. */
    takenAt: z.iso.datetime({ error: 'Measured on must be a date and time', offset: true }).optional(),
    note: text('Note', NOTES_MAX_CHARS).default(''),
  })
  .superRefine((v, ctx) => {
    const [min, max] = [20, 3000];
    if (v.girthMm < min || v.girthMm > max) {
      ctx.addIssue({ code: 'custom', path: ['girthMm'], message: `Girth must be between ${formatGirth(min, v.unit)} and ${formatGirth(max, v.unit)}` });
    }
  });
export type MeasurementInput = z.input<typeof MeasurementSchema>;

// ---- orders ----
/** The stage flow, in order. Our own plain names; any stage may move to any other. */
export const ORDER_STAGES = ['waiting-for-measurement', 'ready-to-cut', 'cut', 'punched', 'assembled', 'finished', 'handed-over'] as const;
export type OrderStage = (typeof ORDER_STAGES)[number];
export const ORDER_STAGE_LABELS: Record<OrderStage, string> = {
  'waiting-for-measurement': 'Waiting for measurement',
  'ready-to-cut': 'Ready to cut',
  cut: 'Cut',
  punched: 'Punched',
  assembled: 'Assembled',
  finished: 'Finished',
  'handed-over': 'Handed over',
};
export const OrderStageSchema = z.enum(ORDER_STAGES, { error: `Stage must be one of: ${ORDER_STAGES.map((s) => ORDER_STAGE_LABELS[s]).join(', ')}` });

/**
 * Where the order's girth comes from: one size of the revision's run, the wearer's latest
 * measurement of the body part the pattern kind fits (or a given one), or later (the order
 * waits for a measurement).
 */
export const OrderFitSchema = z.discriminatedUnion(
  'from',
  [
    z.object({ from: z.literal('size'), sizeName: required('Size', 24) }),
    z.object({ from: z.literal('measurement'), measurementId: id('Measurement').optional() }),
    z.object({ from: z.literal('later') }),
  ],
  { error: 'Girth from must be a size, the latest measurement, or later' },
);
export type OrderFit = z.infer<typeof OrderFitSchema>;

/** Hardware for one piece, from the shop's hardware list (shop standards). */
export const OrderHardwareSchema = z
  .array(z.object({ itemId: required('Hardware item', 80), quantity: whole('Hardware quantity', 1, 50) }), { error: 'Hardware must be a list' })
  .max(20, { error: 'Hardware must be at most 20 lines' });

const orderFields = {
  dueDate: day('Due date'),
  quantity: whole('Quantity', 1, ORDER_QUANTITY_MAX),
  /** A leather of the shop's pricing list (its id); null when not priced yet. */
  leatherId: text('Leather', 80).nullable(),
  leatherColour: text('Leather colour', ORDER_TEXT_MAX_CHARS),
  leatherFinish: text('Finish', ORDER_TEXT_MAX_CHARS),
  thread: text('Thread', ORDER_TEXT_MAX_CHARS),
  notes: text('Notes', NOTES_MAX_CHARS),
  /** Bench time for one piece, minutes. */
  benchMinutes: whole('Bench time', 0, BENCH_MINUTES_MAX),
  /** Omitted or null: matched from the pattern's hardware by kind. */
  hardware: OrderHardwareSchema.nullable(),
};

/** `POST /api/orders`. The customer is the wearer's. */
export const CreateOrderSchema = z.object({
  wearerId: id('Wearer'),
  patternId: id('Pattern'),
  /** A saved revision of the pattern (default its head when the order is made). */
  revision: id('Revision').optional(),
  fit: OrderFitSchema,
  dueDate: orderFields.dueDate,
  quantity: orderFields.quantity.default(1),
  leatherId: orderFields.leatherId.default(null),
  leatherColour: orderFields.leatherColour.default(''),
  leatherFinish: orderFields.leatherFinish.default(''),
  thread: orderFields.thread.default(''),
  notes: orderFields.notes.default(''),
  benchMinutes: orderFields.benchMinutes.default(60),
  hardware: orderFields.hardware.default(null),
});
export type CreateOrderInput = z.input<typeof CreateOrderSchema>;

/** `PATCH /api/orders/:id`: any of the order's fields (not its stage: see {@link MoveOrderSchema}); absent fields stay. */
export const UpdateOrderSchema = z
  .object({ fit: OrderFitSchema, ...orderFields })
  .partial()
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: 'Change at least one field', path: ['notes'] });
export type UpdateOrderInput = z.input<typeof UpdateOrderSchema>;

/** `POST /api/orders/:id/stage`: move along (or back along) the flow. */
export const MoveOrderSchema = z.object({ stage: OrderStageSchema, note: text('Note', NOTES_MAX_CHARS).default('') });
export type MoveOrderInput = z.input<typeof MoveOrderSchema>;

/** `GET /api/orders?...` (board and table). Dates are YYYY-MM-DD, inclusive. */
export const OrderListQuerySchema = z.object({
  /** One stage or several, comma-separated. */
  stage: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(',').filter(Boolean) : []))
    .pipe(z.array(OrderStageSchema)),
  customerId: id('Customer').optional(),
  dueFrom: day('Due from').optional(),
  dueTo: day('Due to').optional(),
  /** Words matched against order number, customer, wearer and pattern names. */
  query: text('Search', SEARCH_MAX_CHARS).optional(),
  /** false (default): every stage; true: leave out handed-over orders. */
  active: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
  sort: z.enum(['due', 'updated', 'number'], { error: 'Sort must be due, updated or number' }).default('due'),
  limit: whole('Limit', 1, ORDER_LIST_LIMIT_MAX).default(200),
});
export type OrderListQuery = z.input<typeof OrderListQuerySchema>;

/** `GET /api/orders/:id/job-sheet.pdf?paper=` (the paper is logged on the order). */
export const JobSheetQuerySchema = z.object({
  paper: z.enum(['letter', 'legal', 'tabloid', 'a4', 'a3'], { error: 'Paper must be letter, legal, tabloid, A4 or A3' }).default('letter'),
});

// ---- measurement request (public page) ----
/** `POST /api/orders/:id/measurement-request`: e-mails the customer a link. */
export const MeasurementRequestSchema = z.object({ message: text('Message to the customer', 1000).default('') });

/**
 * `POST /api/measure/:token`: the customer's answer. Both readings in mm; `unit` is what the
 * page showed (messages use it). The range and agreement depend on the piece kind, so the
 * schema is built per kind.
 */
export function measureAnswerSchema(kind: PresetName) {
  const { minMm, maxMm, agreeMm } = MEASURE_KINDS[kind];
  return z
    .object({
      unit: z.enum(['in', 'cm'], { error: 'Unit must be in or cm' }),
      girthMm: z.number({ error: 'Girth must be a number' }),
      confirmGirthMm: z.number({ error: 'Second reading must be a number' }),
      method: z.enum(MEASURE_METHODS, { error: 'How you measured must be one of the listed ways' }).default('soft-tape'),
      note: text('Anything we should know', 1000).default(''),
    })
    .superRefine((v, ctx) => {
      const range = `between ${formatGirth(minMm, v.unit)} and ${formatGirth(maxMm, v.unit)}`;
      if (v.girthMm < minMm || v.girthMm > maxMm) ctx.addIssue({ code: 'custom', path: ['girthMm'], message: `Girth must be ${range}` });
      if (v.confirmGirthMm < minMm || v.confirmGirthMm > maxMm) ctx.addIssue({ code: 'custom', path: ['confirmGirthMm'], message: `Second reading must be ${range}` });
      else if (Math.abs(v.girthMm - v.confirmGirthMm) > agreeMm) {
        ctx.addIssue({ code: 'custom', path: ['confirmGirthMm'], message: `The two readings differ by more than ${formatGirth(agreeMm, v.unit)}; measure again` });
      }
    });
}
export type MeasureAnswerInput = z.input<ReturnType<typeof measureAnswerSchema>>;
/** The kind-free shape (for forms that pick the kind later). */
export const MeasureAnswerSchema = measureAnswerSchema('collar');

// ---- proof (public page) ----
/** `POST /api/proof/:token/approve`. */
export const ApproveProofSchema = z.object({ name: text('Your name', 100).default('') });
/** `POST /api/proof/:token/change`: ask for a change, with what to change. */
export const ProofChangeSchema = z.object({
  message: required('What should change', CHANGE_MESSAGE_MAX_CHARS),
  name: text('Your name', 100).default(''),
});

// ---- photos ----
/** Multipart field of the photo upload routes, and its optional caption field. */
export const PHOTO_FIELD = 'file';
export const PhotoCaptionSchema = z.object({ caption: text('Caption', CAPTION_MAX_CHARS).default('') });
/** Photo types accepted (judged by the file's first bytes, not its name). */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

// ---- shop pricing ----
const cents = (label: string) => whole(label, 0, PRICE_CENTS_MAX);
export const LeatherPriceSchema = z.object({
  id: required('Leather id', 80).regex(/^[a-z0-9-]+$/, { error: 'Leather id must be lower-case letters, digits and dashes' }),
  name: required('Leather name', 80),
  /** Price per square foot, integer cents of the shop currency. */
  pricePerSqFtCents: cents('Price per square foot'),
});
export const ShopPricingSchema = z
  .object({
    /** ISO 4217 code, e.g. USD, GBP, EUR. */
    currency: z.string({ error: 'Currency is required' }).trim().toUpperCase().regex(/^[A-Z]{3}$/, { error: 'Currency must be a three-letter code such as USD' }),
    wasteFactor: z
      .number({ error: 'Waste factor must be a number' })
      .min(WASTE_FACTOR_MIN, { error: `Waste factor must be at least ${WASTE_FACTOR_MIN}` })
      .max(WASTE_FACTOR_MAX, { error: `Waste factor must be at most ${WASTE_FACTOR_MAX}` }),
    hourlyRateCents: cents('Hourly bench rate'),
    leathers: z.array(LeatherPriceSchema, { error: 'Leathers must be a list' }).max(LEATHERS_MAX, { error: `Leathers must be at most ${LEATHERS_MAX}` }),
  })
  .superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.leathers.forEach((l, i) => {
      if (seen.has(l.id)) ctx.addIssue({ code: 'custom', path: ['leathers', i, 'id'], message: `Leather id ${l.id} is used twice` });
      seen.add(l.id);
    });
  });
export type ShopPricingInput = z.input<typeof ShopPricingSchema>;

/** Kinds of piece an order can be for (the pattern kinds). */
export const ORDER_PIECE_KINDS = PRESET_NAMES;
export type { GirthUnit };
