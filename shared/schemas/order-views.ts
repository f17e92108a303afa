// Response shapes of the orders and customers API: plain TypeScript types the server builds
// and the client reads. Times are ISO 8601 UTC strings; due dates are YYYY-MM-DD; lengths mm;
// money integer cents of the shop's currency.
import type { LengthUnit } from '../units/length.ts';
import type { PresetName } from './strap-spec.ts';
import type { BodyPart, GirthUnit, MeasureMethod, OrderStage, WearerKind } from './orders.ts';

export interface PersonRef {
  id: number;
  name: string;
}

/** A customer. `GET /api/customers` lists them with counts. */
export interface CustomerView {
  id: number;
  name: string;
  email: string;
  phone: string;
  notes: string;
  createdAt: string;
  updatedAt: string;
  wearerCount: number;
  openOrderCount: number;
}

/** One girth of a wearer at one time. `takenBy` is a member, or null with `takenByLabel` "Customer (measuring link)". */
export interface MeasurementView {
  id: number;
  wearerId: number;
  girthMm: number;
  /** The unit it was entered in (how to show it back). */
  unit: GirthUnit;
  part: BodyPart;
  method: MeasureMethod;
  note: string;
  takenAt: string;
  takenBy: PersonRef | null;
  takenByLabel: string;
}

/** A dog, a cat, a person... who wears the pieces. Measurements oldest first (for the chart). */
export interface WearerView {
  id: number;
  customerId: number;
  name: string;
  kind: WearerKind;
  notes: string;
  createdAt: string;
  measurements: MeasurementView[];
}

/** `GET /api/customers/:id`. */
export interface CustomerDetail {
  customer: CustomerView;
  wearers: WearerView[];
  orders: OrderSummary[];
}

/** One row of the board and the table. */
export interface OrderSummary {
  id: number;
  /** Shop-wide order number shown to people ("Order 1004"). */
  number: number;
  stage: OrderStage;
  customer: PersonRef;
  wearer: { id: number; name: string; kind: WearerKind };
  pattern: { id: number; name: string; kind: PresetName };
  revision: number;
  /** The girth the order is made at; null while waiting for a measurement. */
  girthMm: number | null;
  /** The size of the run it was taken from, if any. */
  sizeName: string | null;
  /** The pattern's display unit (how lengths are shown). */
  unit: LengthUnit;
  dueDate: string;
  overdue: boolean;
  quantity: number;
  leatherColour: string;
  leatherFinish: string;
  /** Whole order (all pieces), or null when the shop has no price for its leather yet. */
  priceCents: number | null;
  currency: string;
  /** First photo's thumbnail URL, if any. */
  thumbUrl: string | null;
  proofStatus: ProofStatus | null;
  createdAt: string;
  updatedAt: string;
}

/** `GET /api/orders` -> `{ items: OrderSummary[] }`. */
export interface OrderList {
  items: OrderSummary[];
}

/** What happened to an order, newest first. `summary` is a sentence for people. */
export interface OrderEvent {
  id: number;
  at: string;
  /** A member, or null for the customer (through a link) or the system. */
  by: PersonRef | null;
  byLabel: string;
  kind:
    | 'created'
    | 'updated'
    | 'stage'
    | 'measured'
    | 'measurement-requested'
    | 'proof-sent'
    | 'proof-approved'
    | 'proof-change-requested'
    | 'printed'
    | 'photo-added'
    | 'photo-deleted';
  fromStage: OrderStage | null;
  toStage: OrderStage | null;
  summary: string;
}

/** A job sheet printed for the order. */
export interface PrintLogEntry {
  id: number;
  at: string;
  by: PersonRef | null;
  paper: string;
}

export interface PhotoView {
  id: number;
  caption: string;
  contentType: string;
  byteSize: number;
  widthPx: number;
  heightPx: number;
  createdAt: string;
  by: PersonRef | null;
  /** The full photo and its thumbnail (same-origin; members only, or the proof link's own URLs). */
  url: string;
  thumbUrl: string;
}

/** The cost breakdown of one piece and the order's total (integer cents). */
export interface PriceView {
  currency: string;
  leather: {
    leatherId: string | null;
    name: string | null;
    /** Sum of blank length x blank width of every piece, mm². */
    blankAreaMm2: number;
    wasteFactor: number;
    /** blankAreaMm2 x wasteFactor in square feet (1 sq ft = 92 903.04 mm²). */
    areaSqFt: number;
    pricePerSqFtCents: number | null;
    cents: number;
  };
  hardware: { itemId: string; name: string; quantity: number; unitCostCents: number; cents: number }[];
  bench: { minutes: number; hourlyRateCents: number; cents: number };
  /** leather + hardware + bench, for one piece. */
  pieceCents: number;
  quantity: number;
  /** pieceCents x quantity. */
  totalCents: number;
  /** What is missing for a full price ("No price for this leather"), empty when complete. */
  missing: string[];
}

export type ProofStatus = 'open' | 'approved' | 'change-requested';

export interface ProofLinkView {
  id: number;
  status: ProofStatus;
  createdAt: string;
  createdBy: PersonRef | null;
  answeredAt: string | null;
  answerName: string;
  answerMessage: string;
  revoked: boolean;
}

export interface MeasurementRequestView {
  id: number;
  sentTo: string;
  createdAt: string;
  expiresAt: string;
  answeredAt: string | null;
  expired: boolean;
  /** Withdrawn by the shop: the customer's page answers as if it had run out. */
  revoked: boolean;
}

/** `GET /api/orders/:id` -> `{ order: OrderDetail }` (also what create, update and stage moves answer). */
export interface OrderDetail extends OrderSummary {
  customerEmail: string;
  wearerId: number;
  /** Where the girth came from. */
  fit: { from: 'size'; sizeName: string } | { from: 'measurement'; measurementId: number } | { from: 'later' };
  measurement: MeasurementView | null;
  leatherId: string | null;
  thread: string;
  notes: string;
  benchMinutes: number;
  hardware: { itemId: string; quantity: number }[];
  /** True when the shop chose the hardware lines; false when they are matched from the pattern by kind. */
  hardwareChosen: boolean;
  /** Lengths of the fitted piece for the order screen (null while waiting for a girth). */
  fitted: { finishedLengthMm: number; fitRangeMm: [number, number] | null; blankLengthMm: number } | null;
  price: PriceView | null;
  history: OrderEvent[];
  prints: PrintLogEntry[];
  photos: PhotoView[];
  proofs: ProofLinkView[];
  measurementRequests: MeasurementRequestView[];
  createdBy: PersonRef | null;
}

/** `POST /api/orders/:id/measurement-request` -> 201. */
export interface MeasurementRequestSent {
  request: MeasurementRequestView;
  mail: 'sent' | 'queued' | 'failed';
}

/** `GET /api/measure/:token`: the public measuring page. */
export interface MeasurePage {
  shopName: string;
  customerName: string;
  wearer: { name: string; kind: WearerKind };
  /** What is being made ("collar"), and what to measure ("neck"). */
  pieceKind: PresetName;
  where: string;
  howTo: string[];
  /** Accepted range (mm) and largest difference between the two readings (mm). */
  minMm: number;
  maxMm: number;
  agreeMm: number;
  /** The unit the page starts in (the pattern's: in -> in, mm -> cm). */
  unit: 'in' | 'cm';
  message: string;
  cautions: string[];
  expiresAt: string;
}

/** `POST /api/measure/:token` -> 201. */
export interface MeasureAnswered {
  girthMm: number;
  unit: 'in' | 'cm';
  thanks: string;
}

/** `POST /api/orders/:id/proof` -> 201 (the token is shown only here). */
export interface ProofCreated {
  proof: ProofLinkView;
  token: string;
  /** The client page, `/proof/<token>`. */
  url: string;
}

/**
 * `GET /api/proof/:token`: what the customer sees. Never the template PDF, cutter files,
 * cut list or punch sizes: only the outline drawing, lengths a customer can check, photos,
 * price and due date.
 */
export interface ProofPage {
  shopName: string;
  orderNumber: number;
  customerName: string;
  wearer: { name: string; kind: WearerKind };
  pieceName: string;
  pieceKind: PresetName;
  unit: LengthUnit;
  /** Outline drawing of the finished piece (SVG text, no hole sizes). */
  drawingSvg: string;
  finishedLengthMm: number | null;
  girthMm: number | null;
  /** Girths the piece fits, smallest to largest hole (mm), when it adjusts. */
  fitRangeMm: [number, number] | null;
  leatherColour: string;
  leatherFinish: string;
  quantity: number;
  price: { currency: string; totalCents: number } | null;
  dueDate: string;
  photos: { id: number; caption: string; url: string; thumbUrl: string }[];
  status: ProofStatus;
  answeredAt: string | null;
  answerMessage: string;
}

/** `POST /api/proof/:token/approve|change` -> 200. */
export interface ProofAnswered {
  status: ProofStatus;
  answeredAt: string;
}

/** `GET|PUT /api/shop/pricing` -> `{ pricing }`. */
export interface ShopPricingView {
  currency: string;
  wasteFactor: number;
  hourlyRateCents: number;
  leathers: { id: string; name: string; pricePerSqFtCents: number }[];
  updatedAt: string | null;
  updatedBy: PersonRef | null;
}
