import type { BoxMm } from '@shared/render/drawing.ts';
import type { PagePlan, PlannedPage } from './page-plan.ts';
import { textMm } from './pdf-text.ts';
import { SEAM_COLOR } from './seam-marks.ts';
import { mmToPt } from './units.ts';

/** The lines that tell a sheet's place in the whole and which marks join it. */
export function placeLines(page: PlannedPage, total: number): string[] {
  const lines = [`Page ${page.number} of ${total}`];
  if (!page.run) {
    lines.push('single sheet: cut out each piece on its own');
    return lines;
  }
  const r = page.run;
  lines.push(`${r.sheet} of ${r.sheets} in row ${r.index + 1}`);
  if (page.seamLeft) lines.push(`left: marks ${page.seamLeft.letter} join page ${page.seamLeft.leftPage}`);
  if (page.seamRight) lines.push(`right: marks ${page.seamRight.letter} join page ${page.seamRight.rightPage}`);
  if (page.seamLeft) lines.push(`lay over page ${page.seamLeft.leftPage} so the ${page.seamLeft.letter} marks meet; tape`);
  return lines;
}

/** Draws the page's place (and on page 1 the assembly map) in the band's last column. */
export function drawPagePlace(doc: PDFKit.PDFDocument, plan: PagePlan, page: PlannedPage, box: BoxMm): void {
  const w = box.maxX - box.minX;
  const lines = placeLines(page, plan.pages.length);
  let y = box.minY + 4;
  lines.forEach((line, i) => {
    textMm(doc, line, box.minX, y, { capMm: i === 0 ? 3 : 2, weight: i === 0 ? 'bold' : 'regular', maxWidthMm: w });
    y += i === 0 ? 4.6 : 3.4;
  });
  if (page.number === 1 && plan.pages.length > 1) drawAssemblyMap(doc, plan, { ...box, minY: y });
}

/**
 * A small map of how the sheets assemble: one line of boxes per run, seam letters between
 * them, then the single sheets. Drawn on page 1 only.
 */
export function drawAssemblyMap(doc: PDFKit.PDFDocument, plan: PagePlan, box: BoxMm): void {
  const rows: { pages: number[]; letters: string[] }[] = plan.runs.map((r) => ({ pages: r.pages, letters: r.seams.map((s) => s.letter) }));
  const singles = plan.pages.filter((p) => !p.run).map((p) => p.number);
  if (singles.length > 0) rows.push({ pages: singles, letters: [] });
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY - 3;
  const maxCells = Math.max(...rows.map((r) => r.pages.length));
  const gap = 2.6;
  const colGap = 5;
  const rowGap = 1.5;
  // Many runs: set the rows in up to three columns, whichever gives the biggest cells.
  let best = { cols: 1, cell: 0 };
  for (let cols = 1; cols <= Math.min(3, rows.length); cols++) {
    const perCol = Math.ceil(rows.length / cols);
    const colW = (w - (cols - 1) * colGap) / cols;
    const cell = Math.min(10, (colW - gap * (maxCells - 1)) / maxCells, (h - (perCol - 1) * rowGap) / perCol / 0.75);
    if (cell > best.cell) best = { cols, cell };
  }
  const { cols, cell } = best;
  const perCol = Math.ceil(rows.length / cols);
  const colW = (w - (cols - 1) * colGap) / cols;
  const cellH = cell * 0.75;
  doc.save();
  textMm(doc, 'how the pages join', box.minX, box.minY + 1.2, { capMm: 1.6, color: '#555555' });
  rows.forEach((row, ri) => {
    const col = Math.floor(ri / perCol);
    const top = box.minY + 3 + (ri % perCol) * (cellH + rowGap);
    const left = box.minX + col * (colW + colGap);
    row.pages.forEach((n, ci) => {
      const x = left + ci * (cell + gap);
      doc.lineWidth(mmToPt(0.2)).strokeColor('#000000').undash();
      doc.rect(mmToPt(x), mmToPt(top), mmToPt(cell), mmToPt(cellH)).stroke();
      textMm(doc, String(n), x + cell / 2, top + cellH / 2 + 0.8, { capMm: Math.min(2, cellH * 0.4), anchor: 'middle' });
      const letter = row.letters[ci];
      if (letter) textMm(doc, letter, x + cell + gap / 2, top + cellH / 2 + 0.7, { capMm: Math.min(1.8, cellH * 0.4), anchor: 'middle', weight: 'bold', color: SEAM_COLOR });
    });
  });
  doc.restore();
}
