import { replayPath, type DrawingItem, type DrawingPiece, type LayerName, type PathSink } from '@shared/render/drawing.ts';
import type { Placement } from './page-plan.ts';
import { textMm } from './pdf-text.ts';
import { mmToPt } from './units.ts';

/** Stroke per layer, mm. Renderers style by layer, never by item (drawing.ts). */
export const LAYER_STROKE: Record<Exclude<LayerName, 'label'>, { widthMm: number; color: string; dashMm?: [number, number] }> = {
  guide: { widthMm: 0.18, color: '#6b6b6b', dashMm: [1.2, 0.9] },
  fold: { widthMm: 0.25, color: '#000000', dashMm: [3, 1.5] },
  cut: { widthMm: 0.35, color: '#000000' },
  punch: { widthMm: 0.25, color: '#000000' },
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

function strokeLayer(doc: PDFKit.PDFDocument, layer: Exclude<LayerName, 'label'>, dashed: boolean): void {
  const s = LAYER_STROKE[layer];
  doc.lineWidth(mmToPt(s.widthMm)).strokeColor(s.color).lineJoin('round').lineCap('butt');
  if (dashed && s.dashMm) doc.dash(mmToPt(s.dashMm[0]), { space: mmToPt(s.dashMm[1]) });
  else doc.undash();
  doc.stroke();
}

function drawItem(doc: PDFKit.PDFDocument, item: DrawingItem, ox: number, oy: number): void {
  const map = (x: number, y: number): [number, number] => [mmToPt(x + ox), mmToPt(y + oy)];
  if (item.type === 'text') {
    textMm(doc, item.text, item.x + ox, item.y + oy, {
      capMm: item.sizeMm,
      anchor: item.anchor,
      weight: item.weight ?? 'regular',
      ...(item.rotateDeg ? { rotateDeg: item.rotateDeg } : {}),
    });
    return;
  }
  if (item.layer === 'label') return; // only text belongs on the label layer
  if (item.type === 'circle') {
    const [cx, cy] = map(item.cx, item.cy);
    circlePt(doc, cx, cy, mmToPt(item.r));
    strokeLayer(doc, item.layer, false);
    return;
  }
  replayPath(item.commands, pdfSink(doc), map);
  strokeLayer(doc, item.layer, item.dashed === true);
}

/**
 * Draws a piece (or the tile of it a placement shows) at 1:1, clipped to the placement's
 * row so nothing reaches the margins or the next sheet's part of the piece. Layers are
 * painted in the Drawing's order (guide, fold, cut, punch, label).
 */
export function drawPlacement(doc: PDFKit.PDFDocument, piece: DrawingPiece, pl: Placement, layerOrder: readonly LayerName[]): void {
  doc.save();
  doc.rect(mmToPt(pl.clip.minX), mmToPt(pl.clip.minY), mmToPt(pl.clip.maxX - pl.clip.minX), mmToPt(pl.clip.maxY - pl.clip.minY)).clip();
  for (const layer of layerOrder) {
    for (const item of piece.items) if (item.layer === layer) drawItem(doc, item, pl.offsetXMm, pl.offsetYMm);
  }
  doc.restore();
}
