import type { DrawingItem, TextItem } from '../render/drawing.ts';

/** Label font size (mm, cap to baseline) and the width factor used to estimate text extents. */
export const LABEL_SIZE_MM = 2.5;
export const NAME_SIZE_MM = 3.5;
/** Average advance of a Plex Sans glyph as a fraction of the font size (estimate for bounds). */
export const GLYPH_ADVANCE = 0.6;

/** Estimated length (mm) of a label set at `sizeMm`. */
export function textLengthMm(text: string, sizeMm: number): number {
  return [...text].length * sizeMm * GLYPH_ADVANCE;
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
