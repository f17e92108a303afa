import type { BoxMm, TitleBlock } from '@shared/render/drawing.ts';
import { textMm } from './pdf-text.ts';
import { mmToPt } from './units.ts';

/** Width of the title block in the band, mm. */
export const TITLE_BLOCK_MM = 64;

/** The title block rows, in print order. */
export function titleRows(t: TitleBlock): [string, string][] {
  const rows: [string, string | undefined][] = [
    ['revision', t.revision],
    ['size', t.size],
    ['girth', t.girth],
    ['width', t.width],
    ['leather', t.leather],
    ['date', t.date],
  ];
  return rows.filter((r): r is [string, string] => r[1] !== undefined && r[1] !== '');
}

/** Draws the boxed title block (pattern, revision, size, girth, width, leather, date) at x. */
export function drawTitleBlock(doc: PDFKit.PDFDocument, t: TitleBlock, band: BoxMm, xMm: number): void {
  const w = TITLE_BLOCK_MM;
  const h = band.maxY - band.minY;
  doc.save();
  doc.lineWidth(mmToPt(0.25)).strokeColor('#000000').undash();
  doc.rect(mmToPt(xMm), mmToPt(band.minY), mmToPt(w), mmToPt(h)).stroke();
  textMm(doc, t.pattern, xMm + 2, band.minY + 5, { capMm: 2.8, weight: 'bold', maxWidthMm: w - 4 });
  const rows = titleRows(t);
  const step = Math.min(4.4, (h - 8) / Math.max(1, rows.length));
  rows.forEach(([k, v], i) => {
    const y = band.minY + 9.5 + i * step;
    textMm(doc, k, xMm + 2, y, { capMm: 1.8, color: '#555555' });
    textMm(doc, v, xMm + 17, y, { capMm: 2.1, maxWidthMm: w - 19 });
  });
  doc.restore();
}
