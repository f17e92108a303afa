import { FONT } from './pdf-doc.ts';
import { mmToPt } from './units.ts';

/** IBM Plex Sans cap height as a fraction of the em (698/1000 units, read from the TTF). */
export const PLEX_CAP_PER_EM = 0.698;

/** How a line of text is set; sizes in mm of cap height, as the Drawing's TextItem. */
export interface TextStyle {
  capMm: number;
  anchor?: 'start' | 'middle' | 'end';
  weight?: 'regular' | 'bold';
  color?: string;
  rotateDeg?: number;
  /** Shrink the type (never below 60 %) so the line fits this width. */
  maxWidthMm?: number;
}

function setFont(doc: PDFKit.PDFDocument, s: TextStyle): number {
  const sizePt = mmToPt(s.capMm / PLEX_CAP_PER_EM);
  doc.font(s.weight === 'bold' ? FONT.bold : FONT.regular).fontSize(sizePt);
  return sizePt;
}

/** Width of a line of text in mm at a style. */
export function textWidthMm(doc: PDFKit.PDFDocument, text: string, s: TextStyle): number {
  setFont(doc, s);
  return doc.widthOfString(text) / mmToPt(1);
}

/** Sets one line of text with its baseline at (x, y) mm on the page. Returns its width in mm. */
export function textMm(doc: PDFKit.PDFDocument, text: string, xMm: number, yMm: number, style: TextStyle): number {
  let s = style;
  if (s.maxWidthMm !== undefined) {
    const w = textWidthMm(doc, text, s);
    if (w > s.maxWidthMm) s = { ...s, capMm: Math.max(s.capMm * 0.6, (s.capMm * s.maxWidthMm) / w) };
  }
  setFont(doc, s);
  const wPt = doc.widthOfString(text);
  const shift = s.anchor === 'middle' ? wPt / 2 : s.anchor === 'end' ? wPt : 0;
  const x = mmToPt(xMm);
  const y = mmToPt(yMm);
  doc.save();
  doc.fillColor(s.color ?? '#000000');
  if (s.rotateDeg) doc.rotate(s.rotateDeg, { origin: [x, y] });
  doc.text(text, x - shift, y, { lineBreak: false, baseline: 'alphabetic' });
  doc.restore();
  return wPt / mmToPt(1);
}
