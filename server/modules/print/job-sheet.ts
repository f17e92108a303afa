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

/** Draws the job sheet on the current page (portrait sheet, margins in mm). */
export function drawJobSheet(doc: PDFKit.PDFDocument, js: JobSheet, title: TitleBlock, page: { widthMm: number; heightMm: number; marginMm: number }): void {
  const left = page.marginMm + 4;
  const width = page.widthMm - 2 * left;
  const bottom = page.heightMm - page.marginMm - 4;
  let y = page.marginMm + 10;
  const body: TextStyle = { capMm: 2.3 };
  const line = (text: string, style: TextStyle = body, indent = 0, gap = 4.4): void => {
    for (const l of wrapText(doc, text, width - indent, style)) {
      if (y > bottom) return; // one page by design: the lists are short; never spill silently past the edge
      textMm(doc, l, left + indent, y, style);
      y += gap;
    }
  };
  const heading = (text: string): void => {
    y += 2.5;
    line(text, { capMm: 3, weight: 'bold' }, 0, 6);
  };
  line(`Job sheet · ${title.pattern}`, { capMm: 4.5, weight: 'bold' }, 0, 7);
  line([title.revision, title.size, `girth ${title.girth}`, `width ${title.width}`, title.leather, title.date].filter(Boolean).join(' · '), { capMm: 2.3, color: '#444444' });
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
  doc.save().lineWidth(mmToPt(0.25)).strokeColor('#000000').undash();
  for (const s of js.steps) {
    const box = 2.6;
    if (y <= bottom) doc.rect(mmToPt(left), mmToPt(y - box), mmToPt(box), mmToPt(box)).stroke();
    line(s, body, box + 2.5);
  }
  doc.restore();
  if (js.warnings?.length) {
    heading('Warnings');
    for (const w of js.warnings) line(w);
  }
  heading('Cautions');
  for (const c of js.cautions) line(c, { capMm: 2.1 });
}
