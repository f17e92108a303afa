import type { BoxMm } from '@shared/render/drawing.ts';
import { textMm } from './pdf-text.ts';
import { MM_PER_IN, mmToPt } from './units.ts';

/** The two check squares: outer edge to outer edge, mm. */
export const SQUARES = [
  { sideMm: MM_PER_IN, label: '1 in' },
  { sideMm: 25, label: '25 mm' },
] as const;
/** Gap between the squares, mm. */
export const SQUARE_GAP_MM = 6;
/**
 * Ring thickness: a frame, not a filled block, so it costs little toner. It is painted as
 * four plain rectangles: rasterisers (poppler's splash, printer RIPs) snap plain rectangle
 * fills to the pixel grid cleanly, where an even-odd ring path gained a pixel at 1200 dpi.
 */
const RING_MM = 0.6;
/** The instruction printed with the squares on every page. */
export const SCALE_INSTRUCTION = 'print at 100 % / actual size; measure this square before you cut';

/** Where each square sits on the page (mm), so tests can crop around it. */
export function squareBoxes(band: BoxMm): BoxMm[] {
  let x = band.minX;
  const top = band.maxY - MM_PER_IN;
  return SQUARES.map((s) => {
    const box = { minX: x, maxX: x + s.sideMm, minY: top, maxY: top + s.sideMm };
    x += s.sideMm + SQUARE_GAP_MM;
    return box;
  });
}

/** Width the square block takes in the band, mm. */
export const SQUARE_BLOCK_MM = SQUARES.reduce((w, s) => w + s.sideMm, 0) + SQUARE_GAP_MM + 6;

/**
 * Draws the 1 in and 25 mm squares at the band's bottom-left as filled rings whose outer
 * edges are exact, each labelled, with the instruction above them.
 */
export function drawCalibration(doc: PDFKit.PDFDocument, band: BoxMm): void {
  const boxes = squareBoxes(band);
  doc.save();
  boxes.forEach((b, i) => {
    const s = SQUARES[i];
    if (!s) return;
    const x = mmToPt(b.minX);
    const y = mmToPt(b.minY);
    const side = mmToPt(s.sideMm);
    const t = mmToPt(RING_MM);
    for (const [bx, by, bw, bh] of [
      [x, y, side, t],
      [x, y + side - t, side, t],
      [x, y + t, t, side - 2 * t],
      [x + side - t, y + t, t, side - 2 * t],
    ] as const) {
      doc.rect(bx, by, bw, bh).fill('#000000');
    }
    textMm(doc, s.label, b.minX + s.sideMm / 2, b.minY + s.sideMm / 2 + 1, { capMm: 2.6, anchor: 'middle', weight: 'bold' });
    textMm(doc, 'outer edge', b.minX + s.sideMm / 2, b.minY + s.sideMm / 2 + 5, { capMm: 1.6, anchor: 'middle', color: '#444444' });
  });
  const top = (boxes[0]?.minY ?? band.maxY) - 2;
  const width = SQUARE_BLOCK_MM - 4;
  textMm(doc, 'measure this square before you cut', boxes[0]?.minX ?? band.minX, top, { capMm: 1.9, maxWidthMm: width });
  textMm(doc, 'print at 100 % / actual size;', boxes[0]?.minX ?? band.minX, top - 3, { capMm: 1.9, weight: 'bold', maxWidthMm: width });
  doc.restore();
}
