/**
 * The Layout: plain JSON data the engine computes from a spec. All lengths in mm; every
 * position (`atMm`) is measured from the piece's datum, its start end (the buckle end, or
 * the end nearest the buckle), never chained from another feature.
 */
import type { LengthUnit } from '../units/length.ts';

/** Kinds of feature placed on a piece. */
export type FeatureKind = 'rivet' | 'screw' | 'snap' | 'hole' | 'adjust-hole' | 'slot' | 'fold';

/** The nearest standard round drive punch for a hole. */
export interface PunchSize {
  /** Trade number, e.g. "#3". */
  size: string;
  /** The punch's own diameter in mm. */
  diameterMm: number;
}

/** One feature on a piece. */
export interface Feature {
  kind: FeatureKind;
  /** Centre from the datum along the strap, mm. */
  atMm: number;
  /** Centre across the strap, mm, +y down, 0 on the centreline. */
  yMm: number;
  /** Hole diameter (round holes), mm. */
  diameterMm?: number;
  /** Slot length along the strap, mm. */
  lengthMm?: number;
  /** Slot width across the strap, mm. */
  widthMm?: number;
  punch?: PunchSize;
  /** Leather layers the fastener goes through (2 where a flap hole meets its partner). */
  layers?: number;
  /** Where the partner hole across a fold lies, mm from the datum. */
  partnerAtMm?: number;
  /** True for the flap half of a pair (the half on the folded-back part). */
  onFlap?: boolean;
  label: string;
}

/** A warning: risky but possible geometry. Never silently "fixed". */
export interface Warning {
  code: WarningCode;
  message: string;
  pieceId?: string;
}

/** Stable warning codes. */
export type WarningCode =
  | 'hole-near-edge'
  | 'features-too-close'
  | 'rivet-on-bend'
  | 'tongue-slot-short'
  | 'width-hardware-mismatch'
  | 'tail-short'
  | 'fit-misses-target'
  | 'blank-longer-than-strip'
  | 'stitch-pitch-off'
  | 'd-ring-no-room'
  | 'collar-tight-at-nominal';

/** Fit at one adjustment hole. */
export interface HoleFit {
  atMm: number;
  /** Centreline length of the closed loop with the tongue in this hole, mm. */
  loopMm: number;
  /** Inner circumference of that loop: centreline - pi x thickness (circle geometry), mm. */
  innerMm: number;
}

/** How the strap fits the girth. */
export interface FitReport {
  holes: HoleFit[];
  /** Index into `holes` of the nominal hole (0 = nearest the datum). */
  nominalIndex: number;
  /** Inner lengths at the tightest and loosest hole, mm. */
  rangeMm: [number, number];
  /** Girth + ease, mm. */
  targetMm: number;
  /** Nominal inner length minus the target, mm (negative = tighter than the target). */
  deviationMm: number;
}

/** A stitch row after pitch adjustment. */
export interface StitchRowLayout {
  /** The row's ends and corners in order (mm, piece frame); a hole lands on each. The row itself follows the outline's offset, curves included. */
  points: { x: number; y: number }[];
  /** Each stitch hole's centre. */
  holes: { x: number; y: number }[];
  pitchMm: number;
  adjustedPitchMm: number;
  seamLengthMm: number;
  /** About 4 x seam length for a saddle stitch (common practice). */
  threadMm: number;
}

/** Hardware that rides on a piece (not cut or punched): a D-ring in the buckle-end fold. */
export interface HardwarePlacement {
  item: 'D-ring' | 'swivel snap' | 'trigger snap' | 'ring';
  /** Where the ring's straight bar lies across the strap, mm from the datum (body side of the fold). */
  atMm: number;
  insideWidthMm: number;
  wireDiameterMm: number;
  /** The stretch of the fold loop the ring may ride in, mm from the datum. */
  zoneMm: [number, number];
  /** A few words for the maker on how the ring sits (printed with the hardware label). */
  note: string;
}

/** One piece laid out. */
export interface PieceLayout {
  id: string;
  name: string;
  role: 'strap' | 'bridge' | 'accessory';
  count: number;
  blankLengthMm: number;
  /** Widest width of the piece, mm. */
  widthMm: number;
  /** Width stations resolved to the datum (sorted), mm. */
  widthStations: { atMm: number; widthMm: number }[];
  features: Feature[];
  folds: { atMm: number; bendAllowanceMm: number; barDiameterMm: number }[];
  stitchRows: StitchRowLayout[];
  /** Length the tip/start shapes take at each end, mm (0 for square). */
  shapeDepthMm: { start: number; end: number };
  fit?: FitReport;
  /** Hardware that rides on this piece (the strap's D-rings), when there is any. */
  hardware?: HardwarePlacement[];
  warnings: Warning[];
}

/** Rule and fit side by side for the strap piece. */
export interface RuleVsFit {
  rule: { blankLengthMm: number; nominalAtMm?: number; nominalInnerMm?: number };
  fit: { blankLengthMm: number; nominalAtMm?: number; nominalInnerMm?: number };
  /** fit - rule blank length, mm. */
  blankDeltaMm: number;
  /** How far the adjustment holes move in fit mode, mm (+ toward the tip). */
  holeShiftMm: number;
  summary: string;
}

/** The cut list. */
export interface CutList {
  blanks: { pieceId: string; name: string; count: number; lengthMm: number; widthMm: number; thicknessMm: number }[];
  hardware: { item: string; count: number; note?: string }[];
  fasteners: { kind: string; count: number; stackMm: number; postLengthMm?: number; layers: number }[];
  punches: { size: string; diameterMm: number; holes: number }[];
  threadMm: number;
}

/** The whole pattern laid out. */
export interface PatternLayout {
  engineVersion: string;
  kind: string;
  name: string;
  units: LengthUnit;
  mode: 'rule' | 'fit';
  thicknessMm: number;
  girthMm: number;
  targetMm: number;
  pieces: PieceLayout[];
  /** Fit of the strap piece (copied from it for convenience). */
  fit?: FitReport;
  ruleVsFit: RuleVsFit;
  cutList: CutList;
  /** All warnings of all pieces plus the pattern's own. */
  warnings: Warning[];
}
