import type { BoxMm } from '@shared/render/drawing.ts';
import type { PagePlan, PlannedPage } from './page-plan.ts';
import { textMm, textWidthMm } from './pdf-text.ts';
import { SEAM_COLOR } from './seam-marks.ts';
import { mmToPt } from './units.ts';

/** What the place column needs beside the plan: the whole document's page count and names. */
export interface PlaceContext {
  /** Pages in the PDF, the job sheet included (what the maker counts off the printer). */
  total: number;
  /** One short name per run of the plan (e.g. the size), shown before its row in the map. */
  runLabels: string[];
  /** The job sheet's page number, when there is one. */
  jobSheetPage?: number;
}

/** The lines that tell a sheet's place in the whole and which marks join it. */
export function placeLines(page: PlannedPage, total: number, runLabel?: string): string[] {
  const lines = [`Page ${page.number} of ${total}`];
  if (!page.run) {
    lines.push('single sheet: cut out each piece on its own');
    return lines;
  }
  const r = page.run;
  lines.push(`${r.sheet} of ${r.sheets} in row ${r.index + 1}${runLabel ? ` (${runLabel})` : ''}`);
  if (page.seamLeft) lines.push(`left: marks ${page.seamLeft.letter} join page ${page.seamLeft.leftPage}`);
  if (page.seamRight) lines.push(`right: marks ${page.seamRight.letter} join page ${page.seamRight.rightPage}`);
  if (page.seamLeft) lines.push(`lay over page ${page.seamLeft.leftPage} so the ${page.seamLeft.letter} marks meet; tape`);
  return lines;
}

/** Draws the page's place (and on page 1 the assembly map) in the band's last column. */
export function drawPagePlace(doc: PDFKit.PDFDocument, plan: PagePlan, page: PlannedPage, box: BoxMm, ctx: PlaceContext): void {
  const w = box.maxX - box.minX;
  const lines = placeLines(page, ctx.total, page.run && plan.runs.length > 1 ? ctx.runLabels[page.run.index] : undefined);
  let y = box.minY + 4;
  lines.forEach((line, i) => {
    textMm(doc, line, box.minX, y, { capMm: i === 0 ? 3 : 2, weight: i === 0 ? 'bold' : 'regular', maxWidthMm: w });
    y += i === 0 ? 4.6 : 3.4;
  });
  if (page.number === 1 && ctx.total > 1) drawAssemblyMap(doc, plan, { ...box, minY: y }, ctx);
}

interface MapRow {
  label: string;
  pages: number[];
  letters: string[];
}

/** The map's rows: one per run, then the single sheets, then the job sheet. */
export function mapRows(plan: PagePlan, ctx: PlaceContext): MapRow[] {
  const rows: MapRow[] = plan.runs.map((r, i) => ({ label: ctx.runLabels[i] ?? `row ${i + 1}`, pages: r.pages, letters: r.seams.map((s) => s.letter) }));
  const singles = plan.pages.filter((p) => !p.run).map((p) => p.number);
  if (singles.length > 0) rows.push({ label: 'pieces', pages: singles, letters: [] });
  if (ctx.jobSheetPage !== undefined) rows.push({ label: 'job sheet', pages: [ctx.jobSheetPage], letters: [] });
  return rows;
}

/**
 * A small map of how the sheets assemble: one line of boxes per run, named (the size, the
 * piece) and with the seam letters between them, then the single sheets and the job sheet.
 * Drawn on page 1 only.
 */
export function drawAssemblyMap(doc: PDFKit.PDFDocument, plan: PagePlan, box: BoxMm, ctx: PlaceContext): void {
  const rows = mapRows(plan, ctx);
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY - 3;
  const maxCells = Math.max(...rows.map((r) => r.pages.length));
  const gap = 2.6;
  const colGap = 5;
  const rowGap = 1.5;
  const labelCap = 1.6;
  // Names before the rows, at most a fifth of the column (longer ones shrink).
  const labelW = (colW: number) => Math.min(colW / 5, Math.max(...rows.map((r) => textWidthMm(doc, r.label, { capMm: labelCap }))) + 1.5);
  // Many runs: set the rows in up to three columns, whichever gives the biggest cells.
  let best = { cols: 1, cell: 0 };
  for (let cols = 1; cols <= Math.min(3, rows.length); cols++) {
    const perCol = Math.ceil(rows.length / cols);
    const colW = (w - (cols - 1) * colGap) / cols;
    const cell = Math.min(10, (colW - labelW(colW) - gap * (maxCells - 1)) / maxCells, (h - (perCol - 1) * rowGap) / perCol / 0.75);
    if (cell > best.cell) best = { cols, cell };
  }
  const { cols, cell } = best;
  const perCol = Math.ceil(rows.length / cols);
  const colW = (w - (cols - 1) * colGap) / cols;
  const lw = labelW(colW);
  const cellH = cell * 0.75;
  doc.save();
  textMm(doc, 'how the pages join', box.minX, box.minY + 1.2, { capMm: 1.6, color: '#555555' });
  rows.forEach((row, ri) => {
    const col = Math.floor(ri / perCol);
    const top = box.minY + 3 + (ri % perCol) * (cellH + rowGap);
    const left = box.minX + col * (colW + colGap);
    textMm(doc, row.label, left, top + cellH / 2 + labelCap / 2, { capMm: Math.min(labelCap, cellH * 0.4), color: '#333333', maxWidthMm: lw - 1.5 });
    row.pages.forEach((n, ci) => {
      const x = left + lw + ci * (cell + gap);
      doc.lineWidth(mmToPt(0.2)).strokeColor('#000000').undash();
      doc.rect(mmToPt(x), mmToPt(top), mmToPt(cell), mmToPt(cellH)).stroke();
      textMm(doc, String(n), x + cell / 2, top + cellH / 2 + 0.8, { capMm: Math.min(2, cellH * 0.4), anchor: 'middle' });
      const letter = row.letters[ci];
      if (letter) textMm(doc, letter, x + cell + gap / 2, top + cellH / 2 + 0.7, { capMm: Math.min(1.8, cellH * 0.4), anchor: 'middle', weight: 'bold', color: SEAM_COLOR });
    });
  });
  doc.restore();
}
