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

/** The part of pdfkit 0.20's EmbeddedFont the caches below use. */
interface EmbeddedFontLike {
  /** The parsed fontkit font, one per process (pdf-doc.ts parses each font once). */
  font: object;
  widthOfString(text: string, size: number): number;
}

/** Most lines whose advance is remembered per font; past it the cache starts again. */
const MAX_ADVANCES = 20_000;
const advances = new WeakMap<object, Map<string, number>>();

/**
 * Advance of a line at 1000 pt in the document's current font. A line's width is linear in
 * the size and the same in every document, so it is measured once per process: textMm and
 * the fitting and wrapping around it measured each line two or three times per page, through
 * pdfkit's word splitting and per-document caches (a tenth of a size run's PDF, CPU profile).
 */
function advance1000(doc: PDFKit.PDFDocument, text: string): number {
  const font = (doc as unknown as { _font: EmbeddedFontLike })._font;
  let byText = advances.get(font.font);
  if (!byText) advances.set(font.font, (byText = new Map()));
  let a = byText.get(text);
  if (a === undefined) {
    a = font.widthOfString(text, 1000);
    if (byText.size >= MAX_ADVANCES) byText.clear();
    byText.set(text, a);
  }
  return a;
}

/** Width in points of a line in the document's current font and size (doc.widthOfString without options). */
export function widthPt(doc: PDFKit.PDFDocument, text: string): number {
  // Same arithmetic as pdfkit's (width x size/1000), so positions keep their last digit.
  return advance1000(doc, text) * ((doc as unknown as { _fontSize: number })._fontSize / 1000);
}

/** Width of a line of text in mm at a style. */
export function textWidthMm(doc: PDFKit.PDFDocument, text: string, s: TextStyle): number {
  setFont(doc, s);
  return widthPt(doc, text) / mmToPt(1);
}

/** Sets one line of text with its baseline at (x, y) mm on the page. Returns its width in mm. */
export function textMm(doc: PDFKit.PDFDocument, text: string, xMm: number, yMm: number, style: TextStyle): number {
  let s = style;
  if (s.maxWidthMm !== undefined) {
    const w = textWidthMm(doc, text, s);
    if (w > s.maxWidthMm) s = { ...s, capMm: Math.max(s.capMm * 0.6, (s.capMm * s.maxWidthMm) / w) };
  }
  setFont(doc, s);
  const wPt = widthPt(doc, text);
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

type Encoded = [string[], GlyphPosition[]];
const encodings = new WeakMap<object, Map<string, Encoded>>();

/**
 * The glyph ids and positions of a line, shaped once per document and font: the caution, the
 * title rows and the rulers' figures repeat on every sheet. encode() also adds the glyphs to the
 * document's subset, which the first call has done, so a repeat changes nothing in the file.
 * Read only: setLine never changes what it is given.
 */
function encodeOnce(font: PdfkitInternals['_font'], text: string): Encoded {
  let byText = encodings.get(font);
  if (!byText) encodings.set(font, (byText = new Map()));
  let e = byText.get(text);
  if (!e) byText.set(text, (e = font.encode(text, undefined)));
  return e;
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
  const [encoded, positions] = encodeOnce(font, text);
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
