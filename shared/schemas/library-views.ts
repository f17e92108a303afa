// Response shapes of the library's server modules that the client reads: plain TypeScript
// types (the server builds them, nobody parses them), one definition for both sides.
import type { Feature, PatternLayout } from '../pattern/layout-types.ts';
import type { Drawing } from '../render/drawing.ts';
import type { Role } from './auth.ts';
import type { StrapSpec } from './strap-spec.ts';

/** A print job as `POST .../print-jobs` and `GET /api/print-jobs/:jobId` answer it. */
export interface PrintJobView {
  id: string;
  state: 'queued' | 'running' | 'done' | 'failed';
  /** Laying out the sizes, then drawing the pages; null before the worker starts. */
  stage: 'layout' | 'pages' | null;
  /** Sizes laid out or pages drawn so far, of `total` in the current stage. */
  done: number;
  total: number;
  /** 0..1 over both stages, for a progress bar. */
  progress: number;
  format: 'pdf' | 'svg' | 'cutter.svg';
  fileName: string;
  createdAt: string;
  expiresAt: string;
  /** The job's own URL (poll it) and its file's. */
  url: string;
  fileUrl: string;
  error?: { code: string; message: string; fields?: Record<string, string> };
}

// --- GET /api/patterns/:id/compare?from=&to= ---

/** One changed parameter. `path` is dotted ("pieces.0.end.holes.count"); a value is undefined where absent. */
export interface ParamChange {
  path: string;
  from: unknown;
  to: unknown;
  /** "mm", "oz", "%" or null for counts, flags and names. */
  unit: string | null;
}

/** A feature of one side of a comparison; positions in mm from the piece's datum. */
export interface FeatureRef {
  kind: Feature['kind'];
  label: string;
  atMm: number;
  yMm: number;
}

/** A feature found on both sides at another place (mm). */
export interface MovedFeature {
  kind: Feature['kind'];
  label: string;
  from: { atMm: number; yMm: number };
  to: { atMm: number; yMm: number };
  /** to - from along the strap, mm (+ toward the tip). */
  deltaAtMm: number;
}

/** How one piece differs: blank length (mm) and features moved, added or removed. */
export interface PieceDiff {
  pieceId: string;
  name: string;
  status: 'changed' | 'added' | 'removed';
  blankLengthMm: { from: number | null; to: number | null; deltaMm: number | null };
  moved: MovedFeature[];
  added: FeatureRef[];
  removed: FeatureRef[];
}

/** How two Layouts differ; every length in mm. */
export interface LayoutDiff {
  unit: 'mm';
  targetMm: { from: number; to: number };
  fitRangeMm: { from: [number, number] | null; to: [number, number] | null };
  pieces: PieceDiff[];
  warnings: { added: string[]; removed: string[] };
}

/** The compare answer. */
export interface Comparison {
  from: number;
  to: number;
  params: ParamChange[];
  /** null when either revision no longer lays out (see layoutError). */
  layout: LayoutDiff | null;
  layoutError: string | null;
}

// --- share links: GET /api/patterns/:id/shares, POST /api/patterns/:id/share ---

/** A share link as listed; `revision` null means "whatever the head is when opened". */
export interface ShareView {
  id: number;
  revision: number | null;
  createdAt: string;
  createdBy: string | null;
}

/** Only the creating answer carries the token and URL: the server keeps just a hash. */
export interface CreatedShare extends ShareView {
  token: string;
  url: string;
}

// --- GET /api/patterns/:id/activity ---

/** One row of the pattern's audit trail (who did what, when). */
export interface ActivityItem {
  id: number;
  action: string;
  detail: Record<string, unknown>;
  at: string;
  by: { id: number; name: string } | null;
}

// --- invites: GET /api/shop/invites, GET /api/invites/:token ---

/** An open invite. */
export interface InviteView {
  id: number;
  email: string;
  role: Role;
  shopName: string;
  invitedBy: string | null;
  expiresAt: string;
  createdAt: string;
  expired: boolean;
}

/** What an invite link shows before it is accepted. */
export interface InviteLookup {
  invite: InviteView;
  /** Whether an account with the invited e-mail exists (then only its password is asked). */
  accountExists: boolean;
}

// --- GET /api/s/:token ---

/** One revision, read-only, with nothing else of the shop. */
export interface SharedPattern {
  shopName: string;
  pattern: { name: string; kind: string };
  revision: { number: number; spec: StrapSpec; engineVersion: string; createdAt: string };
  layout: PatternLayout;
  drawing: Drawing;
  downloads: { pdf: string; svg: string; cutterSvg: string };
}
