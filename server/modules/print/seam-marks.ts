import type { PlannedPage, Seam } from './page-plan.ts';
import { textMm } from './pdf-text.ts';
import { mmToPt } from './units.ts';

/** Half-width kept free of ruler numbers round a seam mark, mm: letter, gap and diamond. */
export const SEAM_CLEAR_MM = 6;

/** Page x (mm) of the seam marks crossing a placement, for the ruler to keep clear. */
export function seamXsOn(page: PlannedPage, pl: PlannedPage['placements'][number]): number[] {
  if (!pl.tile) return [];
  return [page.seamLeft, page.seamRight].filter((s): s is Seam => s !== undefined && pl.toXMm > s.overlapFromMm && pl.fromXMm < s.overlapToMm).map((s) => s.markXMm + pl.offsetXMm);
}

/** Colour of join marks: distinct from the black pattern lines, still dark in greyscale. */
export const SEAM_COLOR = '#b0006a';

function diamond(doc: PDFKit.PDFDocument, xMm: number, yMm: number, rMm: number): void {
  const x = mmToPt(xMm);
  const y = mmToPt(yMm);
  const r = mmToPt(rMm);
  doc.moveTo(x, y - r).lineTo(x + r, y).lineTo(x, y + r).lineTo(x - r, y).closePath().fill(SEAM_COLOR);
}

/**
 * Draws a seam's join marks on one sheet: for every row of the run, a line through the row
 * at the seam's datum distance with a diamond and the seam letter at both ends. The same
 * datum distance is drawn on both sheets, so the marks meet when the sheets overlap right.
 */
export function drawSeamMarks(doc: PDFKit.PDFDocument, page: PlannedPage, seam: Seam, side: 'left' | 'right'): void {
  doc.save();
  for (const pl of page.placements) {
    if (!pl.tile) continue; // a small piece packed under the run is not part of the seam
    // A shorter piece of the run may end before this seam: nothing of it to join there.
    if (pl.toXMm <= seam.overlapFromMm || pl.fromXMm >= seam.overlapToMm) continue;
    const x = seam.markXMm + pl.offsetXMm;
    // Letters sit beside the diamonds; keep their cap height inside the row (and the area).
    // The bottom ones sit in the ruler's number line, the one line of the row the pattern's
    // own labels never use; the ruler leaves its numbers out there (SEAM_CLEAR_MM).
    const top = pl.clip.minY + 2.6;
    const bottom = pl.clip.maxY - 1.2;
    doc.lineWidth(mmToPt(0.2)).strokeColor(SEAM_COLOR).dash(mmToPt(1.5), { space: mmToPt(1) });
    doc.moveTo(mmToPt(x), mmToPt(top)).lineTo(mmToPt(x), mmToPt(bottom)).stroke();
    doc.undash();
    diamond(doc, x, top, 1.2);
    diamond(doc, x, bottom, 1.2);
    const dx = side === 'right' ? -1.8 : 1.8;
    const anchor = side === 'right' ? 'end' : 'start';
    textMm(doc, seam.letter, x + dx, top + 0.9, { capMm: 2.4, weight: 'bold', color: SEAM_COLOR, anchor });
    textMm(doc, seam.letter, x + dx, bottom + 1, { capMm: 2.4, weight: 'bold', color: SEAM_COLOR, anchor });
  }
  doc.restore();
}
