import type { BoxMm } from '@shared/render/drawing.ts';
import { FRAME, pageFrame, type PageFrame } from './page-frame.ts';
import type { PaperSize } from './paper.ts';
import type { Orientation } from './print-options.ts';
import { packRuns, packShelves, rowHeightMm, type FreeRegion, type PlanPiece } from './pack.ts';

/** A tile seam: where sheet `leftPage` and the next sheet of the run overlap. */
export interface Seam {
  /** "A", "B", ... unique in the document. */
  letter: string;
  runIndex: number;
  /** 1-based page numbers of the two sheets the seam joins. */
  leftPage: number;
  rightPage: number;
  /** Distance of the join mark from the buckle-end datum, mm (same for every piece of the run). */
  markXMm: number;
  /** Start and end of the overlap, mm from the datum. */
  overlapFromMm: number;
  overlapToMm: number;
}

/** A piece, or the part of it a tile shows, placed on a page. */
export interface Placement {
  pieceIndex: number;
  /** page mm = piece mm + offset. */
  offsetXMm: number;
  offsetYMm: number;
  /** The piece's x range shown on this page, mm from its datum. */
  fromXMm: number;
  toXMm: number;
  /** The row on the page (caption, piece, ruler); the piece is clipped to it. */
  clip: BoxMm;
  /** Set when the piece runs over several sheets; index is 0-based. */
  tile?: { index: number; count: number };
}

/** One sheet of the template. */
export interface PlannedPage {
  /** 1-based. */
  number: number;
  placements: Placement[];
  /** When the page is a sheet of a tiled run. */
  run?: { index: number; sheet: number; sheets: number };
  /** The seam joining the previous sheet (left) and the next (right). */
  seamLeft?: Seam;
  seamRight?: Seam;
}

/** A run: sheets taped side by side, carrying one or more long pieces stacked in rows. */
export interface PlannedRun {
  index: number;
  pages: number[];
  pieceIndexes: number[];
  seams: Seam[];
}

/** How a drawing is laid out on sheets. */
export interface PagePlan {
  frame: PageFrame;
  overlapMm: number;
  pages: PlannedPage[];
  runs: PlannedRun[];
  seams: Seam[];
}

/** Most sheets one template may have: beyond this the paper is far too small for the job. */
export const MAX_PAGES = 400;

/** Geometry of pieces too big for the chosen paper, or options that leave no room. */
export class PagePlanError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'PagePlanError';
  }
}

function seamLetter(i: number): string {
  let s = '';
  let n = i;
  do {
    s = String.fromCharCode(65 + (n % 26)) + s;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return s;
}

/** Plans the pages for one orientation; throws {@link PagePlanError} when it cannot fit. */
export function planPagesIn(
  pieces: readonly PlanPiece[],
  sheet: PaperSize,
  orientation: 'portrait' | 'landscape',
  marginMm: number,
  overlapMm: number,
): PagePlan {
  const frame = pageFrame(sheet, orientation, marginMm);
  const aw = frame.area.maxX - frame.area.minX;
  const ah = frame.area.maxY - frame.area.minY;
  if (aw < FRAME.minPrintableWidthMm) {
    throw new PagePlanError('margin', `margin: ${sheet.label} ${orientation} leaves ${aw.toFixed(1)} mm printable width; the page needs ${FRAME.minPrintableWidthMm} mm`);
  }
  if (overlapMm >= aw / 2) {
    throw new PagePlanError('overlap', `overlap: ${overlapMm.toFixed(1)} mm must be under half the drawing width (${(aw / 2).toFixed(1)} mm)`);
  }
  for (const p of pieces) {
    const h = rowHeightMm(p);
    if (h > ah) {
      throw new PagePlanError('paper', `paper: piece "${p.name}" needs ${h.toFixed(1)} mm of height with its labels; ${sheet.label} ${orientation} leaves ${ah.toFixed(1)} mm`);
    }
  }
  const long = pieces.filter((p) => p.bounds.maxX - p.bounds.minX > aw);
  const short = pieces.filter((p) => p.bounds.maxX - p.bounds.minX <= aw);
  const pages: PlannedPage[] = [];
  const runs: PlannedRun[] = [];
  const seams: Seam[] = [];

  const free: FreeRegion[] = [];
  for (const run of packRuns(long, frame, overlapMm)) {
    const first = pages.length + 1;
    const runIndex = runs.length;
    const runSeams: Seam[] = [];
    for (let k = 0; k < run.sheets - 1; k++) {
      const from = run.originXMm + (k + 1) * run.stepMm;
      const seam: Seam = {
        letter: seamLetter(seams.length),
        runIndex,
        leftPage: first + k,
        rightPage: first + k + 1,
        markXMm: from + overlapMm / 2,
        overlapFromMm: from,
        overlapToMm: from + overlapMm,
      };
      seams.push(seam);
      runSeams.push(seam);
    }
    for (let k = 0; k < run.sheets; k++) {
      const left = runSeams[k - 1];
      const right = runSeams[k];
      pages.push({
        number: first + k,
        placements: run.placements[k] ?? [],
        run: { index: runIndex, sheet: k + 1, sheets: run.sheets },
        ...(left ? { seamLeft: left } : {}),
        ...(right ? { seamRight: right } : {}),
      });
    }
    runs.push({ index: runIndex, pages: Array.from({ length: run.sheets }, (_, k) => first + k), pieceIndexes: run.pieceIndexes, seams: runSeams });
    // The room under the rows, last sheet first (a strap's tip sheet is the emptiest).
    for (let k = run.sheets - 1; k >= 0; k--) {
      free.push({ pageIndex: first - 1 + k, box: { minX: frame.area.minX, maxX: frame.area.maxX, minY: run.freeFromYMm, maxY: frame.area.maxY } });
    }
  }
  const shelves = packShelves(short, frame, free);
  for (const [pageIndex, placements] of shelves.into) pages[pageIndex]?.placements.push(...placements);
  for (const placements of shelves.pages) {
    pages.push({ number: pages.length + 1, placements });
  }
  if (pages.length > MAX_PAGES) {
    throw new PagePlanError('paper', `paper: ${sheet.label} ${orientation} would need ${pages.length} sheets; at most ${MAX_PAGES}: choose larger paper or fewer sizes`);
  }
  return { frame, overlapMm, pages, runs, seams };
}

/**
 * Plans the pages: tiles pieces longer than the drawing area into runs of sheets, packs the
 * rest onto shared sheets, and with `orientation: 'auto'` takes whichever orientation needs
 * fewer pages (then fewer seams; portrait on a tie, the way printers feed).
 */
export function planPages(
  pieces: readonly PlanPiece[],
  sheet: PaperSize,
  orientation: Orientation,
  marginMm: number,
  overlapMm: number,
): PagePlan {
  if (orientation !== 'auto') return planPagesIn(pieces, sheet, orientation, marginMm, overlapMm);
  const tries: (PagePlan | PagePlanError)[] = (['portrait', 'landscape'] as const).map((o) => {
    try {
      return planPagesIn(pieces, sheet, o, marginMm, overlapMm);
    } catch (e) {
      if (e instanceof PagePlanError) return e;
      throw e;
    }
  });
  const ok = tries.filter((t): t is PagePlan => !(t instanceof PagePlanError));
  if (ok.length === 0) throw tries[0] as PagePlanError;
  ok.sort((a, b) => a.pages.length - b.pages.length || a.seams.length - b.seams.length);
  return ok[0] as PagePlan;
}
