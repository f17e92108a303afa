/**
 * The Drawing: what the engine hands to every renderer (SVG in the browser and in Node,
 * PDF pages on the server, the cutter export). Plain JSON-serialisable data, all lengths
 * in millimetres.
 *
 * Coordinates of a piece: x runs along the strap from the buckle-end datum (x = 0) to the
 * tip (x = blank length); y runs across it with the centreline at y = 0 and +y downward
 * (the SVG convention). Curves are cubic Béziers only, never arcs: pdfkit's arc starts a
 * new subpath and would break a cut outline, and one primitive set keeps both renderers
 * byte-stable.
 */

/** Drawing layers, in paint order. Renderers style by layer, never by item. */
export const LAYERS = ['guide', 'fold', 'cut', 'punch', 'label'] as const;
/** One of {@link LAYERS}. */
export type LayerName = (typeof LAYERS)[number];

/** One path command; points in mm in the piece's frame. */
export type PathCommand =
  | { op: 'M'; x: number; y: number }
  | { op: 'L'; x: number; y: number }
  | { op: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { op: 'Z' };

/** An open or closed path (outline, fold line, edge guide, slot, centre cross, dimension line). */
export interface PathItem {
  type: 'path';
  layer: LayerName;
  commands: PathCommand[];
  /** Dashed in renderers that can dash (fold and guide lines); purely visual. */
  dashed?: boolean;
}

/** A punched round hole or the circle of a rivet/snap/screw hole; centre and radius in mm. */
export interface CircleItem {
  type: 'circle';
  layer: LayerName;
  cx: number;
  cy: number;
  r: number;
}

/**
 * A label. `sizeMm` is the font's em size in mm: what SVG's `font-size` means, so a PDF
 * renderer sets the font at sizeMm x 72 / 25.4 pt (IBM Plex Sans: capitals stand 0.698 em,
 * ascender 1.025 em, descender 0.275 em). (x, y) is the start, middle or end of the baseline
 * per `anchor`; rotation in degrees, clockwise. The engine lays labels out horizontally and
 * estimates their extent at 0.6 em a character (conservative for Plex).
 */
export interface TextItem {
  type: 'text';
  layer: 'label';
  x: number;
  y: number;
  text: string;
  sizeMm: number;
  anchor: 'start' | 'middle' | 'end';
  rotateDeg?: number;
  weight?: 'regular' | 'bold';
}

/** Anything drawn on a piece. */
export type DrawingItem = PathItem | CircleItem | TextItem;

/** Axis-aligned box in mm. */
export interface BoxMm {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** One blank to cut (a collar, a watch strap's long piece, a keeper). */
export interface DrawingPiece {
  /** Stable id inside the pattern, e.g. "strap", "long", "short", "keeper". */
  id: string;
  /** Human label, e.g. "Collar, 13 in neck". */
  name: string;
  /** Blank length along x and maximum width across y, in mm (the cut outline's extent). */
  lengthMm: number;
  widthMm: number;
  /** Extent of everything drawn, labels included; renderers size sheets from this. */
  bounds: BoxMm;
  items: DrawingItem[];
  /** The size of a run this piece belongs to, with its girth and width as the title block shows them. */
  size?: { name: string; girth: string; width: string };
}

/** Title block printed with the drawing. Strings are already formatted for display. */
export interface TitleBlock {
  pattern: string;
  revision?: string;
  size?: string;
  girth: string;
  width: string;
  leather: string;
  date?: string;
  units: 'in' | 'mm';
  /** Extra lines (rule vs fit, warnings), already formatted; renderers may print them. */
  notes?: string[];
}

/** A whole pattern's drawing: one or more pieces plus the title block. */
export interface Drawing {
  title: TitleBlock;
  pieces: DrawingPiece[];
}

/** The tiny sink every renderer implements (d3-path style). Units are the renderer's own. */
export interface PathSink {
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  curveTo(x1: number, y1: number, x2: number, y2: number, x: number, y: number): void;
  closePath(): void;
}

/** Replays path commands into a sink, mapping each point through `map` (e.g. mm to pt). */
export function replayPath(
  commands: readonly PathCommand[],
  sink: PathSink,
  map: (x: number, y: number) => [number, number] = (x, y) => [x, y],
): void {
  for (const c of commands) {
    if (c.op === 'Z') sink.closePath();
    else if (c.op === 'C') {
      const [x1, y1] = map(c.x1, c.y1);
      const [x2, y2] = map(c.x2, c.y2);
      const [x, y] = map(c.x, c.y);
      sink.curveTo(x1, y1, x2, y2, x, y);
    } else {
      const [x, y] = map(c.x, c.y);
      if (c.op === 'M') sink.moveTo(x, y);
      else sink.lineTo(x, y);
    }
  }
}
