import type { TitleBlock } from '@shared/render/drawing.ts';
import { textMm, textWidthMm, type TextStyle } from './pdf-text.ts';
import { mmToPt } from './units.ts';

/** What the job sheet lists; strings already formatted in the pattern's units. */
export interface JobSheet {
  cutList: { piece: string; blank: string; qty: number; note?: string }[];
  hardware: string[];
  rivets: { where: string; stack: string; post: string }[];
  punches: { what: string; size: string; count: number }[];
  steps: string[];
  cautions: string[];
  warnings?: string[];
  /** An order's own lines (who for, quantity, leather colour and finish, thread, notes), first. */
  order?: { heading: string; lines: string[] };
}

/** Breaks text into lines no wider than `widthMm` at a style. */
export function wrapText(doc: PDFKit.PDFDocument, text: string, widthMm: number, style: TextStyle): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (line && textWidthMm(doc, next, style) > widthMm) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** Type never shrinks below this share of its size to fit the page (still readable at the bench). */
const MIN_SCALE = 0.7;

/**
 * Draws the job sheet on the current page (portrait sheet, margins in mm). One page by design:
 * when the lists (a long cut list, an order's notes) would run past the foot, the type and
 * line gaps shrink together until everything fits, so the cautions printed last are never lost.
 */
export function drawJobSheet(doc: PDFKit.PDFDocument, js: JobSheet, title: TitleBlock, page: { widthMm: number; heightMm: number; marginMm: number }): void {
  const bottom = page.heightMm - page.marginMm - 4;
  let scale = 1;
  while (scale > MIN_SCALE && layOut(doc, js, title, page, scale, false) > bottom) scale = Math.max(MIN_SCALE, scale - 0.05);
  layOut(doc, js, title, page, scale, true);
}

/** Sets the sheet at a type scale (drawing only when `draw`); returns where the text ended, mm. */
function layOut(doc: PDFKit.PDFDocument, js: JobSheet, title: TitleBlock, page: { widthMm: number; heightMm: number; marginMm: number }, scale: number, draw: boolean): number {
  const left = page.marginMm + 4;
  const width = page.widthMm - 2 * left;
  const bottom = page.heightMm - page.marginMm - 4;
  let y = page.marginMm + 10;
  const sized = (s: TextStyle): TextStyle => ({ ...s, capMm: s.capMm * scale });
  const body: TextStyle = { capMm: 2.3 };
  const line = (text: string, style: TextStyle = body, indent = 0, gap = 4.4): void => {
    for (const l of wrapText(doc, text, width - indent, sized(style))) {
      // Past the foot only at the smallest type: never spill silently past the edge.
      if (draw && y <= bottom) textMm(doc, l, left + indent, y, sized(style));
      y += gap * scale;
    }
  };
  const heading = (text: string): void => {
    y += 2.5 * scale;
    line(text, { capMm: 3, weight: 'bold' }, 0, 6);
  };
  line(`Job sheet · ${title.pattern}`, { capMm: 4.5, weight: 'bold' }, 0, 7);
  line([title.revision, title.size, `girth ${title.girth}`, `width ${title.width}`, title.leather, title.date].filter(Boolean).join(' · '), { capMm: 2.3, color: '#444444' });
  if (js.order?.lines.length) {
    heading(js.order.heading);
    for (const o of js.order.lines) line(o);
  }
  heading('Cut list');
  for (const c of js.cutList) line(`${c.qty} x ${c.piece}: ${c.blank}${c.note ? ` (${c.note})` : ''}`);
  if (js.hardware.length) {
    heading('Hardware');
    for (const h of js.hardware) line(h);
  }
  if (js.rivets.length) {
    heading('Rivet posts');
    for (const r of js.rivets) line(`${r.where}: leather stack ${r.stack}, post ${r.post}`);
  }
  if (js.punches.length) {
    heading('Punches');
    for (const p of js.punches) line(`${p.count} x ${p.what}: ${p.size}`);
  }
  heading('Steps');
  if (draw) doc.save().lineWidth(mmToPt(0.25)).strokeColor('#000000').undash();
  for (const s of js.steps) {
    const box = 2.6 * scale;
    if (draw && y <= bottom) doc.rect(mmToPt(left), mmToPt(y - box), mmToPt(box), mmToPt(box)).stroke();
    line(s, body, box + 2.5 * scale);
  }
  if (draw) doc.restore();
  if (js.warnings?.length) {
    heading('Warnings');
    for (const w of js.warnings) line(w);
  }
  heading('Cautions');
  for (const c of js.cautions) line(c, { capMm: 2.1 });
  // y is the next baseline; the last line drawn sat one gap above it.
  return y - 4.4 * scale;
}
