import type { BoxMm } from '@shared/render/drawing.ts';
import type { PaperSize } from './paper.ts';

/** Heights of the page furniture under the drawing area, in mm. */
export const FRAME = {
  /** Squares, title block, page place / assembly map. */
  bandMm: 34,
  /** The one-line cautions at the foot of the page. */
  cautionMm: 3.5,
  /** Space between the drawing area and the band. */
  gapMm: 2.5,
  /** Narrowest printable width the band's three columns fit in. */
  minPrintableWidthMm: 180,
} as const;

/** One page's geometry in mm, origin top-left, y downward (as pdfkit and SVG). */
export interface PageFrame {
  orientation: 'portrait' | 'landscape';
  widthMm: number;
  heightMm: number;
  marginMm: number;
  /** Where the pattern is drawn; nothing of the pattern leaves it. */
  area: BoxMm;
  /** The furniture band (squares, title block, place and map). */
  band: BoxMm;
  /** The cautions line. */
  caution: BoxMm;
}

/** Lays out one sheet in an orientation: printable area, drawing area, furniture band. */
export function pageFrame(sheet: PaperSize, orientation: 'portrait' | 'landscape', marginMm: number): PageFrame {
  const widthMm = orientation === 'portrait' ? sheet.widthMm : sheet.heightMm;
  const heightMm = orientation === 'portrait' ? sheet.heightMm : sheet.widthMm;
  const left = marginMm;
  const right = widthMm - marginMm;
  const bottom = heightMm - marginMm;
  const caution = { minX: left, maxX: right, minY: bottom - FRAME.cautionMm, maxY: bottom };
  const band = { minX: left, maxX: right, minY: caution.minY - FRAME.bandMm, maxY: caution.minY };
  const area = { minX: left, maxX: right, minY: marginMm, maxY: band.minY - FRAME.gapMm };
  return { orientation, widthMm, heightMm, marginMm, area, band, caution };
}

/** Width and height of a box. */
export function boxSize(b: BoxMm): { w: number; h: number } {
  return { w: b.maxX - b.minX, h: b.maxY - b.minY };
}
