import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import { mmToPt } from './units.ts';

/** The embedded fonts (IBM Plex Sans, OFL, fonts/): nothing is fetched at print time. */
export const FONT_FILES = {
  regular: fileURLToPath(new URL('../../../fonts/IBMPlexSans-Regular.ttf', import.meta.url)),
  bold: fileURLToPath(new URL('../../../fonts/IBMPlexSans-SemiBold.ttf', import.meta.url)),
} as const;

/** Font names registered in every document. */
export const FONT = { regular: 'plex', bold: 'plex-semibold' } as const;

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
  doc.registerFont(FONT.regular, FONT_FILES.regular);
  doc.registerFont(FONT.bold, FONT_FILES.bold);
  return doc;
}

/** Adds a page of the given size in mm with no pdfkit margins (we place everything). */
export function addPageMm(doc: PDFKit.PDFDocument, widthMm: number, heightMm: number): void {
  doc.addPage({ size: [mmToPt(widthMm), mmToPt(heightMm)], margin: 0 });
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
