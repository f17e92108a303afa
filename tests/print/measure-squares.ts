// Measures both calibration squares on every page of a printed PDF as a ruler would: each
// page rendered round the square at 1200 dpi, antialiasing off, outer edge to outer edge.
import { squareBoxes, SQUARES } from '../../server/modules/print/calibration.ts';
import { pageFrame } from '../../server/modules/print/page-frame.ts';
import type { PrintOptions } from '../../server/modules/print/print-options.ts';
import { darkSpan, pageSizesPt, renderCrop } from './pdf-tools.ts';

export const DPI = 1200;
/** What a true square reads at {@link DPI}: 1 in = 1200 px, 25 mm = 1181.10 px (1 in = 25.4 mm). */
export const EXPECTED_PX = SQUARES.map((s) => (s.sideMm / 25.4) * DPI);

export interface SquareReading {
  page: number;
  square: number;
  widthPx: number;
  heightPx: number;
}

/** Readings of both squares on each page of the PDF at `path` (bytes `pdf`), printed with `options`. */
export async function measurePdfSquares(path: string, pdf: Buffer, options: Pick<PrintOptions, 'sheet' | 'marginMm'>): Promise<SquareReading[]> {
  const out: SquareReading[] = [];
  for (const [i, size] of (await pageSizesPt(pdf)).entries()) {
    const band = pageFrame(options.sheet, size.width > size.height ? 'landscape' : 'portrait', options.marginMm).band;
    squareBoxes(band).forEach((b, k) => {
      // 1.5 mm round the square: clear of the instruction text above it.
      const g = renderCrop(path, i + 1, DPI, { minX: b.minX - 1.5, maxX: b.maxX + 1.5, minY: b.minY - 1.5, maxY: b.maxY + 1.5 });
      // Through the middle only the ring's two sides are dark; the column a quarter in
      // stays clear of the label inside the square.
      const row = darkSpan(g, 'row', Math.round(g.height / 2));
      const col = darkSpan(g, 'col', Math.round(g.width / 2) - Math.round(g.width / 4));
      out.push({ page: i + 1, square: k, widthPx: row ? row.last - row.first + 1 : 0, heightPx: col ? col.last - col.first + 1 : 0 });
    });
  }
  return out;
}

/** Relative error of a reading against the true square. */
export const scaleError = (px: number, square: number) => Math.abs(px - (EXPECTED_PX[square] ?? 0)) / (EXPECTED_PX[square] ?? 1);
