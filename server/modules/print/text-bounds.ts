import PDFDocument from 'pdfkit';
import type { BoxMm, DrawingPiece, TextItem } from '@shared/render/drawing.ts';
import { FONT, FONT_FILES } from './pdf-doc.ts';
import { widthPt } from './pdf-text.ts';
import { mmToPt } from './units.ts';

// A document never written out, used only to measure text with the fonts we embed.
let measurer: PDFKit.PDFDocument | undefined;
function doc(): PDFKit.PDFDocument {
  if (!measurer) {
    measurer = new PDFDocument({ autoFirstPage: false });
    measurer.registerFont(FONT.regular, FONT_FILES.regular);
    measurer.registerFont(FONT.bold, FONT_FILES.bold);
  }
  return measurer;
}

/** Plex ascender and descender per em (1025 / -275 of 1000 units, read from the TTF). */
const ASCENT = 1.025;
const DESCENT = 0.275;

/** The box a label covers on the page, mm, measured with the embedded Plex metrics. */
export function textBox(t: TextItem): BoxMm {
  const d = doc();
  const em = t.sizeMm; // the em, as SVG's font-size (shared/render/drawing.ts)
  d.font(t.weight === 'bold' ? FONT.bold : FONT.regular).fontSize(mmToPt(em));
  const w = widthPt(d, t.text) / mmToPt(1);
  const x0 = t.anchor === 'middle' ? -w / 2 : t.anchor === 'end' ? -w : 0;
  const corners = [
    [x0, -em * ASCENT],
    [x0 + w, -em * ASCENT],
    [x0, em * DESCENT],
    [x0 + w, em * DESCENT],
  ] as const;
  const a = ((t.rotateDeg ?? 0) * Math.PI) / 180;
  const cos = Math.cos(a);
  const sin = Math.sin(a);
  const xs = corners.map(([x, y]) => t.x + x * cos - y * sin);
  const ys = corners.map(([x, y]) => t.y + x * sin + y * cos);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}

/**
 * The piece's bounds grown to hold every label as Plex really sets it: the Drawing's bounds
 * are estimated without the font, and a label past them would be clipped or hit the caption.
 */
export function measuredBounds(piece: DrawingPiece): BoxMm {
  const b = { ...piece.bounds };
  for (const item of piece.items) {
    if (item.type !== 'text') continue;
    const t = textBox(item);
    b.minX = Math.min(b.minX, t.minX);
    b.maxX = Math.max(b.maxX, t.maxX);
    b.minY = Math.min(b.minY, t.minY);
    b.maxY = Math.max(b.maxY, t.maxY);
  }
  return b;
}
