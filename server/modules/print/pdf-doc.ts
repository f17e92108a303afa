import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import { gatherPageContent } from './pdf-content-stream.ts';
import { cacheFontWork, type CacheableFont } from './pdf-font-cache.ts';
import { mmToPt } from './units.ts';

/** The embedded fonts (IBM Plex Sans, OFL, fonts/): nothing is fetched at print time. */
export const FONT_FILES = {
  regular: fileURLToPath(new URL('../../../fonts/IBMPlexSans-Regular.ttf', import.meta.url)),
  bold: fileURLToPath(new URL('../../../fonts/IBMPlexSans-SemiBold.ttf', import.meta.url)),
} as const;

/** Font names registered in every document. */
export const FONT = { regular: 'plex', bold: 'plex-semibold' } as const;

/** The parsed font object pdfkit keeps inside its EmbeddedFont (pdfkit 0.20: `_font.font`). */
type ParsedFont = { layout: (...args: unknown[]) => unknown; _glyphs?: Record<number, unknown> };

// Parsed once per process and shared by every document: parsing Plex's tables and layout
// lookups cost more than drawing a whole template (about 100 ms of 140 ms for the collar).
// pdfkit still subsets per document. The font is parsed by pdfkit itself, so it is the very
// fontkit build pdfkit uses (importing fontkit here resolved a different build under vitest).
let parsed: { regular: ParsedFont; bold: ParsedFont } | undefined;
function parseOnce(path: string): ParsedFont {
  const scratch = new PDFDocument({ autoFirstPage: false });
  scratch.registerFont('f', path);
  scratch.font('f');
  const font = (scratch as unknown as { _font: { font: ParsedFont } })._font.font;
  cacheFontWork(font as unknown as CacheableFont);
  return font;
}
function fonts(): { regular: ParsedFont; bold: ParsedFont } {
  parsed ??= { regular: parseOnce(FONT_FILES.regular), bold: parseOnce(FONT_FILES.bold) };
  // fontkit caches glyph objects with the characters of their first use; a glyph first met
  // by another document's subsetting has none, and its ToUnicode entry (text copy, search)
  // went missing. Each document starts with an empty glyph cache, as a freshly parsed font.
  parsed.regular._glyphs = {};
  parsed.bold._glyphs = {};
  return parsed;
}

/** A date that changes nothing between runs when the caller gives none. */
export const FIXED_DATE = new Date(Date.UTC(2000, 0, 1));

/** Document metadata; the date is fixed so the same input gives the same bytes. */
export interface DocMeta {
  title: string;
  subject?: string;
  date?: Date;
}

/**
 * A pdfkit document with Plex registered, no automatic first page and fixed metadata dates
 * (pdfkit derives the file /ID from them, so nothing random remains in the output).
 */
export function createDoc(meta: DocMeta): PDFKit.PDFDocument {
  const date = meta.date ?? FIXED_DATE;
  const doc = new PDFDocument({
    autoFirstPage: false,
    // No default font: pdfkit would parse Helvetica's metrics for every document (a few per
    // cent of a template's time) and we only ever set text in Plex.
    font: null as unknown as string,
    compress: true,
    info: {
      Title: meta.title,
      Subject: meta.subject ?? 'True-scale strap template',
      Creator: 'Latchet',
      Producer: 'Latchet',
      CreationDate: date,
      ModDate: date,
    },
  });
  const f = fonts();
  // @types/pdfkit only lists paths and buffers; pdfkit 0.20 also takes a parsed font.
  doc.registerFont(FONT.regular, f.regular as unknown as string);
  doc.registerFont(FONT.bold, f.bold as unknown as string);
  return doc;
}

/** Adds a page of the given size in mm with no pdfkit margins (we place everything). */
export function addPageMm(doc: PDFKit.PDFDocument, widthMm: number, heightMm: number): void {
  doc.addPage({ size: [mmToPt(widthMm), mmToPt(heightMm)], margin: 0 });
  gatherPageContent(doc);
}

/** Ends the document and collects its bytes. */
export function finishDoc(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
