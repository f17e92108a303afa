// Poppler and pdf-lib helpers for the print tests: write a PDF under test-output/, render a
// crop of a page to greyscale pixels, read page sizes and text back.
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { PDFDocument } from 'pdf-lib';
import type { BoxMm } from '@shared/render/drawing.ts';

export const OUT_DIR = join(process.cwd(), 'test-output', 'print', 'tests');

/** Writes bytes under test-output/print/tests and returns the path. */
export function writeOut(name: string, bytes: Buffer | string): string {
  mkdirSync(OUT_DIR, { recursive: true });
  const p = join(OUT_DIR, name);
  writeFileSync(p, bytes);
  return p;
}

/** A greyscale raster: 0 black .. 255 white, row-major. */
export interface Gray {
  width: number;
  height: number;
  data: Uint8Array;
}

/** Parses a binary PGM (P5, maxval 255) as pdftoppm -gray writes it. */
export function parsePgm(buf: Buffer): Gray {
  let pos = 0;
  const tokens: string[] = [];
  while (tokens.length < 4) {
    while (buf[pos] === 0x20 || buf[pos] === 0x0a || buf[pos] === 0x0d || buf[pos] === 0x09) pos++;
    let t = '';
    while (pos < buf.length && !(buf[pos] === 0x20 || buf[pos] === 0x0a || buf[pos] === 0x0d || buf[pos] === 0x09)) t += String.fromCharCode(buf[pos++] ?? 0);
    tokens.push(t);
  }
  pos++; // the single whitespace after maxval
  const [magic, w, h] = tokens;
  if (magic !== 'P5') throw new Error(`not a P5 PGM: ${magic}`);
  return { width: Number(w), height: Number(h), data: new Uint8Array(buf.subarray(pos)) };
}

/**
 * Renders a crop of one page at `dpi` with antialiasing off (so an edge is a hard pixel
 * step, as a ruler reads it). The crop is given in mm from the page's top-left.
 */
export function renderCrop(pdfPath: string, page: number, dpi: number, crop?: BoxMm): Gray {
  const px = (mm: number) => Math.round((mm / 25.4) * dpi);
  const args = ['-gray', '-r', String(dpi), '-aa', 'no', '-aaVector', 'no', '-f', String(page), '-l', String(page)];
  if (crop) args.push('-x', String(px(crop.minX)), '-y', String(px(crop.minY)), '-W', String(px(crop.maxX - crop.minX)), '-H', String(px(crop.maxY - crop.minY)));
  args.push(pdfPath);
  return parsePgm(execFileSync('pdftoppm', args, { maxBuffer: 1 << 28 }));
}

/** Dark run along one row or column: first and last pixel darker than `threshold`. */
export function darkSpan(g: Gray, axis: 'row' | 'col', index: number, threshold = 128): { first: number; last: number } | undefined {
  const n = axis === 'row' ? g.width : g.height;
  let first = -1;
  let last = -1;
  for (let i = 0; i < n; i++) {
    const v = axis === 'row' ? g.data[index * g.width + i] : g.data[i * g.width + index];
    if ((v ?? 255) < threshold) {
      if (first < 0) first = i;
      last = i;
    }
  }
  return first < 0 ? undefined : { first, last };
}

/** Page sizes in points as pdf-lib reads them back. */
export async function pageSizesPt(pdf: Buffer): Promise<{ width: number; height: number }[]> {
  const doc = await PDFDocument.load(pdf);
  return doc.getPages().map((p) => p.getSize());
}

/** Text of one page via pdftotext (which reads the embedded ToUnicode map). */
export function pageText(pdfPath: string, page: number): string {
  return execFileSync('pdftotext', ['-f', String(page), '-l', String(page), '-layout', pdfPath, '-'], { encoding: 'utf8' });
}
