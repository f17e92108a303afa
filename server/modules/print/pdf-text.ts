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
  setLine(doc, text, x - shift, y);
  doc.restore();
  return wPt / mmToPt(1);
}

/** A glyph position as fontkit gives it and pdfkit scales it (1/1000 em). */
interface GlyphPosition {
  xAdvance: number;
  xOffset: number;
  yOffset: number;
  advanceWidth: number;
}
/** The pdfkit 0.20 internals setLine writes through. */
interface PdfkitInternals {
  _font: { id: string; encode(text: string, features?: unknown): [string[], GlyphPosition[]]; ref(): unknown };
  _fontSize: number;
  page: { height: number; fonts: Record<string, unknown> };
  addContent(op: string): unknown;
}

/** pdfkit's number format for content operators (PDFObject.number). */
function pdfNumber(n: number): number {
  if (n > -1e21 && n < 1e21) return Math.round(n * 1e6) / 1e6;
  throw new Error(`unsupported number: ${n}`);
}

/**
 * What `doc.text(text, x, y, { lineBreak: false, baseline: 'alphabetic' })` writes for one
 * line, operator for operator (pdfkit 0.20.2's _fragment), without the option handling,
 * wrapping and repeated measuring around it: text was the largest part of a template's time
 * in a CPU profile, and every label, caption and page line comes through here.
 */
function setLine(doc: PDFKit.PDFDocument, text: string, x: number, y: number): void {
  if (text.includes('\n')) {
    doc.text(text, x, y, { lineBreak: false, baseline: 'alphabetic' });
    return;
  }
  if (text.length === 0) return;
  const d = doc as unknown as PdfkitInternals;
  doc.save();
  doc.transform(1, 0, 0, -1, 0, d.page.height);
  const ty = d.page.height - y - 0;
  const font = d._font;
  if (d.page.fonts[font.id] == null) d.page.fonts[font.id] = font.ref();
  d.addContent('BT');
  d.addContent(`1 0 0 1 ${pdfNumber(x)} ${pdfNumber(ty)} Tm`);
  d.addContent(`/${font.id} ${pdfNumber(d._fontSize)} Tf`);
  const [encoded, positions] = font.encode(text, undefined);
  const scale = d._fontSize / 1000;
  const commands: string[] = [];
  let last = 0;
  let hadOffset = false;
  let gx = x;
  const addSegment = (cur: number) => {
    if (last < cur) {
      const hex = encoded.slice(last, cur).join('');
      const p = positions[cur - 1]!;
      commands.push(`<${hex}> ${pdfNumber(-(p.xAdvance - p.advanceWidth))}`);
    }
    last = cur;
  };
  const flush = (i: number) => {
    addSegment(i);
    if (commands.length > 0) {
      d.addContent(`[${commands.join(' ')}] TJ`);
      commands.length = 0;
    }
  };
  let i = 0;
  for (; i < positions.length; i++) {
    const pos = positions[i]!;
    if (pos.xOffset || pos.yOffset) {
      flush(i);
      d.addContent(`1 0 0 1 ${pdfNumber(gx + pos.xOffset * scale)} ${pdfNumber(ty + pos.yOffset * scale)} Tm`);
      flush(i + 1);
      hadOffset = true;
    } else {
      if (hadOffset) {
        d.addContent(`1 0 0 1 ${pdfNumber(gx)} ${pdfNumber(ty)} Tm`);
        hadOffset = false;
      }
      if (pos.xAdvance - pos.advanceWidth !== 0) addSegment(i + 1);
    }
    gx += pos.xAdvance * scale;
  }
  flush(i);
  d.addContent('ET');
  doc.restore();
}
