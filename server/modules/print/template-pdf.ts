import { LAYERS, type Drawing, type DrawingPiece } from '@shared/render/drawing.ts';
import { drawCalibration, SQUARE_BLOCK_MM } from './calibration.ts';
import { cautionKind, cautionLine } from '@shared/pattern/cautions.ts';
import { drawDatumRuler } from './datum-ruler.ts';
import { fmtLength } from './format-length.ts';
import { drawJobSheet, type JobSheet } from './job-sheet.ts';
import { ROW, type PlanPiece } from './pack.ts';
import { drawPagePlace, type PlaceContext } from './page-place.ts';
import { runLabels, sheetTitle } from './run-labels.ts';
import { FRAME, pageFrame } from './page-frame.ts';
import { planPages, type PagePlan, type PlannedPage } from './page-plan.ts';
import { addPageMm, createDoc, finishDoc } from './pdf-doc.ts';
import { drawPlacement } from './pdf-draw.ts';
import { textMm } from './pdf-text.ts';
import { measuredBounds } from './text-bounds.ts';
import type { PrintOptions } from './print-options.ts';
import { drawSeamMarks, seamXsOn } from './seam-marks.ts';
import { drawTitleBlock, TITLE_BLOCK_MM } from './title-block.ts';

/** What a template PDF is built from. */
export interface TemplateInput {
  drawing: Drawing;
  options: PrintOptions;
  /** The job sheet appended when options.jobSheet is set (see jobSheetFromLayout). */
  jobSheet?: JobSheet;
  /** Revision date: becomes the PDF's fixed CreationDate/ModDate. */
  date?: Date;
  /** Piece kind for the cautions ("collar", "leash", ...); guessed from the title if absent. */
  kind?: string;
  /** Printed first on every page's footer line (a trial print says it is not saved). */
  footerNote?: string;
  /** Called after each page is drawn (done, total), for progress on long runs. */
  onProgress?: (done: number, total: number) => void;
}

/**
 * Clear space kept round each piece's bounds, mm, so strokes on the extent are not clipped:
 * more along the strap (the cut line sits on the bounds' ends), less across it (labels).
 */
export const PIECE_PAD_MM = 2;
const PIECE_PAD_Y_MM = 1;

/** The planner's view of a Drawing's pieces (labels measured in Plex, padded by {@link PIECE_PAD_MM}). */
export function planPieces(drawing: Drawing): PlanPiece[] {
  const pad = PIECE_PAD_MM;
  return drawing.pieces.map((p, index) => {
    const b = measuredBounds(p);
    return {
      index,
      id: p.id,
      name: p.name,
      lengthMm: p.lengthMm,
      bounds: { minX: b.minX - pad, maxX: b.maxX + pad, minY: b.minY - PIECE_PAD_Y_MM, maxY: b.maxY + PIECE_PAD_Y_MM },
    };
  });
}

/** Lays the drawing out on sheets per the options (exported so tests can check the tiling). */
export function planTemplate(drawing: Drawing, options: PrintOptions): PagePlan {
  return planPages(planPieces(drawing), options.sheet, options.orientation, options.marginMm, options.overlapMm);
}

function caption(doc: PDFKit.PDFDocument, piece: DrawingPiece, page: PlannedPage, plan: PagePlan, drawing: Drawing): void {
  for (const pl of page.placements) {
    if (drawing.pieces[pl.pieceIndex] !== piece) continue;
    const parts = [piece.name, `blank ${fmtLength(piece.lengthMm, drawing.title.units)}`];
    if (pl.tile && pl.tile.count > 1) parts.push(`part ${pl.tile.index + 1} of ${pl.tile.count}`);
    const x = pl.clip.minX + (page.seamLeft ? plan.overlapMm + 2 : 0);
    const maxWidthMm = Math.max(20, pl.clip.maxX - x - (page.seamRight ? plan.overlapMm + 2 : 0));
    textMm(doc, parts.join(' · '), x, pl.clip.minY + ROW.captionMm - 1.6, { capMm: 2.2, weight: 'bold', maxWidthMm });
  }
}

function drawPage(doc: PDFKit.PDFDocument, input: TemplateInput, plan: PagePlan, page: PlannedPage, caution: string, place: PlaceContext): void {
  const { drawing } = input;
  const f = plan.frame;
  addPageMm(doc, f.widthMm, f.heightMm);
  for (const pl of page.placements) {
    const piece = drawing.pieces[pl.pieceIndex];
    if (!piece) continue;
    caption(doc, piece, { ...page, placements: [pl] }, plan, drawing);
    drawPlacement(doc, piece, pl, LAYERS);
    drawDatumRuler(doc, piece, pl, drawing.title.units, seamXsOn(page, pl));
  }
  if (page.seamLeft) drawSeamMarks(doc, page, page.seamLeft, 'left');
  if (page.seamRight) drawSeamMarks(doc, page, page.seamRight, 'right');
  drawCalibration(doc, f.band);
  const titleX = f.band.minX + SQUARE_BLOCK_MM + 2;
  drawTitleBlock(doc, sheetTitle(drawing, page), f.band, titleX);
  const placeX = titleX + TITLE_BLOCK_MM + 4;
  drawPagePlace(doc, plan, page, { ...f.band, minX: placeX }, place);
  textMm(doc, caution, f.caution.minX, f.caution.maxY - 0.6, { capMm: 1.5, maxWidthMm: f.caution.maxX - f.caution.minX, color: '#222222' });
}

/**
 * Builds the true-scale template PDF: the drawing at 1:1 (points = mm x 72 / 25.4), tiled
 * and packed per the options, with squares, title block, page place, seam marks, datum
 * rulers and cautions on every page, and the job sheet when asked for. Same input, same bytes.
 */
export async function buildTemplatePdf(input: TemplateInput): Promise<Buffer> {
  const { drawing, options } = input;
  const plan = planTemplate(drawing, options);
  const t = drawing.title;
  const doc = createDoc({
    title: [t.pattern, t.revision, t.size].filter(Boolean).join(' · '),
    ...(input.date ? { date: input.date } : {}),
  });
  const cautions = cautionLine(cautionKind(input.kind ?? `${t.pattern} ${drawing.pieces.map((p) => p.name).join(' ')}`));
  const caution = input.footerNote ? `${input.footerNote} · ${cautions}` : cautions;
  const withJobSheet = options.jobSheet && input.jobSheet !== undefined;
  const total = plan.pages.length + (withJobSheet ? 1 : 0);
  const place: PlaceContext = {
    total,
    runLabels: runLabels(plan, drawing.pieces.map((p) => p.name)),
    ...(withJobSheet ? { jobSheetPage: total } : {}),
  };
  for (const page of plan.pages) {
    drawPage(doc, input, plan, page, caution, place);
    input.onProgress?.(page.number, total);
  }
  if (options.jobSheet && input.jobSheet) {
    // The job sheet is a portrait page of the same paper; it keeps the squares (every page
    // carries them) and its text stops above them.
    const jf = pageFrame(options.sheet, 'portrait', options.marginMm);
    addPageMm(doc, jf.widthMm, jf.heightMm);
    drawJobSheet(doc, input.jobSheet, t, { widthMm: jf.widthMm, heightMm: jf.band.minY - FRAME.gapMm + options.marginMm, marginMm: options.marginMm });
    drawCalibration(doc, jf.band);
    // It is counted in every sheet's "Page n of N", so it says its own number too.
    const x = jf.band.minX + SQUARE_BLOCK_MM + 2;
    textMm(doc, `Page ${total} of ${total}`, x, jf.band.minY + 4, { capMm: 3, weight: 'bold' });
    textMm(doc, [input.footerNote, `job sheet · ${t.pattern}`].filter(Boolean).join(' · '), x, jf.band.minY + 8.6, { capMm: 2, maxWidthMm: jf.band.maxX - x });
    input.onProgress?.(total, total);
  }
  return finishDoc(doc);
}
