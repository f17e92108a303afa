import type { BoxMm, DrawingItem, TextItem } from '../render/drawing.ts';

/** Label font size (mm, em size: the SVG font-size) of feature and distance labels. */
export const LABEL_SIZE_MM = 2.5;
/** Font size (mm, em) of a piece's name. */
export const NAME_SIZE_MM = 3.5;
/**
 * Advance of one character as a fraction of the em, for estimating extents without the font.
 * Conservative for IBM Plex Sans: its digits advance 0.6 em and our labels average 0.43-0.53 em
 * (measured with pdfkit on fonts/IBMPlexSans-Regular.ttf); only runs of W or m are wider.
 */
export const GLYPH_ADVANCE = 0.6;
/** IBM Plex Sans ascender and descender per em (1025 and 275 of 1000 units, from the TTF). */
export const ASCENT_PER_EM = 1.025;
export const DESCENT_PER_EM = 0.275;

/** Estimated length (mm) of a label set at `sizeMm` (em). */
export function textLengthMm(text: string, sizeMm: number): number {
  return codePointCount(text) * sizeMm * GLYPH_ADVANCE;
}

/**
 * Characters in a string as `[...text].length` counts them (a surrogate pair is one, a lone
 * surrogate one), without building the array: labels are measured many times per drawing.
 */
export function codePointCount(text: string): number {
  let n = text.length;
  for (let i = 0; i < text.length - 1; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        n--;
        i++;
      }
    }
  }
  return n;
}

/** Estimated box (mm) a label covers: its advance by the font's ascender and descender, turned by its rotation. */
export function textBoxMm(t: TextItem): BoxMm {
  const w = textLengthMm(t.text, t.sizeMm);
  const x0 = t.anchor === 'middle' ? -w / 2 : t.anchor === 'end' ? -w : 0;
  const x1 = x0 + w;
  const top = -t.sizeMm * ASCENT_PER_EM;
  const bottom = t.sizeMm * DESCENT_PER_EM;
  const a = ((t.rotateDeg ?? 0) * Math.PI) / 180;
  const cos = Math.cos(a);
  const sin = Math.sin(a);
  // The four corners turned about the anchor, without arrays: every label of every drawing
  // passes here, and the garbage collector was a fifth of drawLayout's profile.
  const ax = t.x + x0 * cos - top * sin, bx = t.x + x1 * cos - top * sin, cx = t.x + x0 * cos - bottom * sin, dx = t.x + x1 * cos - bottom * sin;
  const ay = t.y + x0 * sin + top * cos, by = t.y + x1 * sin + top * cos, cy = t.y + x0 * sin + bottom * cos, dy = t.y + x1 * sin + bottom * cos;
  return { minX: Math.min(ax, bx, cx, dx), maxX: Math.max(ax, bx, cx, dx), minY: Math.min(ay, by, cy, dy), maxY: Math.max(ay, by, cy, dy) };
}

/** Box (mm) holding every item: path points (Bézier control points included), circles, estimated text boxes. */
export function itemsBounds(items: readonly DrawingItem[]): BoxMm {
  const b: BoxMm = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const add = (x: number, y: number) => {
    b.minX = Math.min(b.minX, x);
    b.maxX = Math.max(b.maxX, x);
    b.minY = Math.min(b.minY, y);
    b.maxY = Math.max(b.maxY, y);
  };
  for (const it of items) {
    if (it.type === 'circle') {
      add(it.cx - it.r, it.cy - it.r);
      add(it.cx + it.r, it.cy + it.r);
    } else if (it.type === 'text') {
      const t = textBoxMm(it);
      add(t.minX, t.minY);
      add(t.maxX, t.maxY);
    } else
      for (const c of it.commands) {
        if (c.op === 'Z') continue;
        if (c.op === 'C') {
          add(c.x1, c.y1);
          add(c.x2, c.y2);
        }
        add(c.x, c.y);
      }
  }
  return b;
}

/** A label item. */
export function label(x: number, y: number, text: string, opts: Partial<Pick<TextItem, 'sizeMm' | 'anchor' | 'rotateDeg' | 'weight'>> = {}): TextItem {
  return {
    type: 'text',
    layer: 'label',
    x,
    y,
    text,
    sizeMm: opts.sizeMm ?? LABEL_SIZE_MM,
    anchor: opts.anchor ?? 'start',
    ...(opts.rotateDeg !== undefined ? { rotateDeg: opts.rotateDeg } : {}),
    ...(opts.weight ? { weight: opts.weight } : {}),
  };
}

/** A straight path on the label layer (dimension line, tick, leader). */
export function labelLine(x1: number, y1: number, x2: number, y2: number): DrawingItem {
  return { type: 'path', layer: 'label', commands: [{ op: 'M', x: x1, y: y1 }, { op: 'L', x: x2, y: y2 }] };
}
