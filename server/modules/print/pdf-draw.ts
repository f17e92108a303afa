import { replayPath, type DrawingItem, type DrawingPiece, type LayerName, type PathSink } from '@shared/render/drawing.ts';
import type { Placement } from './page-plan.ts';
import { PLEX_CAP_PER_EM, textMm } from './pdf-text.ts';
import { mmToPt } from './units.ts';

/** Stroke per layer, mm. Renderers style by layer, never by item (drawing.ts). */
export const LAYER_STROKE: Record<LayerName, { widthMm: number; color: string; dashMm?: [number, number] }> = {
  guide: { widthMm: 0.18, color: '#6b6b6b', dashMm: [1.2, 0.9] },
  fold: { widthMm: 0.25, color: '#000000', dashMm: [3, 1.5] },
  cut: { widthMm: 0.35, color: '#000000' },
  punch: { widthMm: 0.25, color: '#000000' },
  // Dimension lines, ticks and group brackets: thin, so they never read as a cut.
  label: { widthMm: 0.12, color: '#333333' },
};

/** Bézier constant for a quarter circle: 4/3 (sqrt 2 - 1). */
const KAPPA = 0.5522847498307936;

/** A pdfkit path sink in points. */
export function pdfSink(doc: PDFKit.PDFDocument): PathSink {
  return {
    moveTo: (x, y) => void doc.moveTo(x, y),
    lineTo: (x, y) => void doc.lineTo(x, y),
    curveTo: (x1, y1, x2, y2, x, y) => void doc.bezierCurveTo(x1, y1, x2, y2, x, y),
    closePath: () => void doc.closePath(),
  };
}

/** A circle as four cubic Béziers in points (pdfkit's arc() would break the path). */
export function circlePt(doc: PDFKit.PDFDocument, cx: number, cy: number, r: number): void {
  const k = r * KAPPA;
  doc.moveTo(cx + r, cy);
  doc.bezierCurveTo(cx + r, cy + k, cx + k, cy + r, cx, cy + r);
  doc.bezierCurveTo(cx - k, cy + r, cx - r, cy + k, cx - r, cy);
  doc.bezierCurveTo(cx - r, cy - k, cx - k, cy - r, cx, cy - r);
  doc.bezierCurveTo(cx + k, cy - r, cx + r, cy - k, cx + r, cy);
  doc.closePath();
}

/**
 * The stroke style last set inside one placement (`key` is layer + dash), so a run of items on
 * one layer sets width, colour, join, cap and dash once instead of before every stroke: those
 * operators were about half of a page's content stream. Only strokes happen between items
 * (text saves and restores the graphics state round itself), so the style stays in force.
 */
interface StrokeState {
  key: string | null;
}

function strokeLayer(doc: PDFKit.PDFDocument, layer: LayerName, dashed: boolean, state: StrokeState): void {
  const s = LAYER_STROKE[layer];
  const dash = dashed && s.dashMm !== undefined;
  const key = `${layer}${dash ? '-dashed' : ''}`;
  if (state.key !== key) {
    doc.lineWidth(mmToPt(s.widthMm)).strokeColor(s.color).lineJoin('round').lineCap('butt');
    if (dash && s.dashMm) doc.dash(mmToPt(s.dashMm[0]), { space: mmToPt(s.dashMm[1]) });
    else doc.undash();
    state.key = key;
  }
  doc.stroke();
}

function drawItem(doc: PDFKit.PDFDocument, item: DrawingItem, ox: number, oy: number, state: StrokeState): void {
  const map = (x: number, y: number): [number, number] => [mmToPt(x + ox), mmToPt(y + oy)];
  if (item.type === 'text') {
    // sizeMm is the em, as SVG's font-size (the Drawing contract), so print and preview match.
    textMm(doc, item.text, item.x + ox, item.y + oy, {
      capMm: item.sizeMm * PLEX_CAP_PER_EM,
      anchor: item.anchor,
      weight: item.weight ?? 'regular',
      ...(item.rotateDeg ? { rotateDeg: item.rotateDeg } : {}),
    });
    return;
  }
  if (item.type === 'circle') {
    const [cx, cy] = map(item.cx, item.cy);
    circlePt(doc, cx, cy, mmToPt(item.r));
    strokeLayer(doc, item.layer, false, state);
    return;
  }
  replayPath(item.commands, pdfSink(doc), map);
  strokeLayer(doc, item.layer, item.dashed === true, state);
}

/** Along-strap extent of an item, mm, generous for text (used only to skip what a tile cannot show). */
export function itemSpanX(item: DrawingItem): [number, number] {
  if (item.type === 'circle') return [item.cx - item.r, item.cx + item.r];
  if (item.type === 'text') {
    // Plex advances are under 0.75 em (the em is sizeMm). Turned text spans its height.
    const len = item.text.length * item.sizeMm * 0.75;
    const turned = item.rotateDeg !== undefined && Math.abs(Math.abs(item.rotateDeg % 180) - 90) < 1e-6;
    if (turned) return [item.x - item.sizeMm * 1.4, item.x + item.sizeMm * 1.4];
    if (item.rotateDeg) return [item.x - len, item.x + len];
    if (item.anchor === 'start') return [item.x, item.x + len];
    if (item.anchor === 'end') return [item.x - len, item.x];
    return [item.x - len / 2, item.x + len / 2];
  }
  let lo = Infinity;
  let hi = -Infinity;
  for (const c of item.commands) {
    if (c.op === 'Z') continue;
    lo = Math.min(lo, c.x);
    hi = Math.max(hi, c.x);
    if (c.op === 'C') {
      lo = Math.min(lo, c.x1, c.x2);
      hi = Math.max(hi, c.x1, c.x2);
    }
  }
  return [lo, hi];
}

/**
 * Draws a piece (or the tile of it a placement shows) at 1:1, clipped to the placement's
 * row so nothing reaches the margins or the next sheet's part of the piece. Layers are
 * painted in the Drawing's order (guide, fold, cut, punch, label).
 */
export function drawPlacement(doc: PDFKit.PDFDocument, piece: DrawingPiece, pl: Placement, layerOrder: readonly LayerName[]): void {
  doc.save();
  doc.rect(mmToPt(pl.clip.minX), mmToPt(pl.clip.minY), mmToPt(pl.clip.maxX - pl.clip.minX), mmToPt(pl.clip.maxY - pl.clip.minY)).clip();
  // Skip items wholly off this tile: the clip would hide them anyway, and a long strap's
  // labels would otherwise be written into every sheet's content stream.
  const visible = piece.items.filter((item) => {
    const [lo, hi] = itemSpanX(item);
    return hi >= pl.fromXMm - 1 && lo <= pl.toXMm + 1;
  });
  const state: StrokeState = { key: null };
  for (const layer of layerOrder) {
    for (const item of visible) if (item.layer === layer) drawItem(doc, item, pl.offsetXMm, pl.offsetYMm, state);
  }
  doc.restore();
}
