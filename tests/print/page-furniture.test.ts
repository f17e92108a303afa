// What a maker reads off the sheets beside the drawing: page counts that match the stack
// out of the printer, an assembly map naming each row, seam marks clear of the datum ruler,
// and job-sheet steps that hold for every size of a run.
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from '@shared/pattern/index.ts';
import { jobSheetFromRun } from '../../server/modules/print/job-sheet-from-layout.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import { printRevisionInline } from '../../server/modules/print/index.ts';
import { buildTemplatePdf, planTemplate } from '../../server/modules/print/template-pdf.ts';
import { beltDrawing } from './fixtures.ts';
import { pageSizesPt, pageText, writeOut } from './pdf-tools.ts';

const IN = 25.4; // mm per inch, exact (International Yard and Pound Agreement, 1959)
// Five collar girths 10-18 in, 2 in apart (common practice for a graded run).
const RUN = ['XS', 'S', 'M', 'L', 'XL'].map((name, i) => ({ name, girthMm: (10 + 2 * i) * IN }));
const META = { patternName: "Juniper's collar", revision: 4, date: '2026-12-01', sizes: RUN };

const PT = 72 / IN; // points per mm (ISO 32000-1: 1 pt = 1/72 in)

/** Every word on a page with its box in mm from the top-left (poppler pdftotext -bbox). */
function wordBoxes(path: string, page: number) {
  const html = execFileSync('pdftotext', ['-bbox', '-f', String(page), '-l', String(page), path, '-'], { encoding: 'utf8' });
  return [...html.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)].map((m) => ({ x0: Number(m[1]) / PT, y0: Number(m[2]) / PT, x1: Number(m[3]) / PT, y1: Number(m[4]) / PT, text: m[5] ?? '' }));
}

describe('page furniture', () => {
  it('when a size run prints with its job sheet, then every sheet counts the job sheet in "Page n of N", N is the PDF page count (pdf-lib), and page 1 maps each size and the job sheet', async () => {
    const f = await printRevisionInline(presetSpec('collar'), { paper: 'letter', size: 'all', jobSheet: true }, META);
    const path = writeOut('furniture-run.pdf', f.body);
    const n = (await pageSizesPt(f.body)).length;
    for (let p = 1; p <= n; p++) expect(pageText(path, p), `page ${p}`).toContain(`Page ${p} of ${n}`);
    expect(pageText(path, n)).toMatch(/job sheet/);
    // The map's words: right of the title block, below the map's heading (the title block
    // lists the sizes too, so only the map's own column counts). Rows are named by the size.
    const words = wordBoxes(path, 1);
    const heading = words.find((w) => w.text === 'how');
    expect(heading).toBeDefined();
    const map = words.filter((w) => w.x0 >= (heading?.x0 ?? 0) - 0.5 && w.y0 > (heading?.y1 ?? 0)).map((w) => w.text);
    expect(map.join(' ')).toContain('job sheet');
    const tokens = new Set(map.flatMap((t) => t.split(/[^A-Za-z]+/)));
    for (const s of RUN) expect([...tokens], map.join(' ')).toContain(s.name);
  });

  it('when the belt tiles across sheets, then no ruler number sits under a seam letter or diamond, and both marks of each seam are printed (pdftotext -bbox, poppler render at 100 dpi)', async () => {
    const d = beltDrawing();
    const options = parsePrintOptions({ paper: 'letter' });
    const plan = planTemplate(d, options);
    const path = writeOut('furniture-seams.pdf', await buildTemplatePdf({ drawing: d, options }));
    let seams = 0;
    for (const page of plan.pages) {
      const words = wordBoxes(path, page.number);
      for (const pl of page.placements.filter((p) => p.tile)) {
        for (const seam of [page.seamLeft, page.seamRight]) {
          if (!seam) continue;
          const x = seam.markXMm + pl.offsetXMm;
          // The bottom letter and diamond: within 4 mm of the line, in the row's last 4 mm.
          const near = words.filter((w) => w.y1 > pl.clip.maxY - 4 && w.y0 < pl.clip.maxY && w.x1 > x - 4 && w.x0 < x + 4);
          expect(near.map((w) => w.text), `page ${page.number} seam ${seam.letter}`).toEqual([seam.letter]);
          seams++;
        }
      }
    }
    // Every seam is seen from both of its sheets.
    expect(seams).toBe(2 * plan.seams.length);
    expect(plan.seams.length).toBeGreaterThan(0);
  });

  it('when a job sheet covers a five-size run, then its cutting step names no single blank length and punches, rivets and hardware count per strap', () => {
    const spec = presetSpec('collar');
    const run = RUN.map((s) => {
      const sized = { ...spec, girthMm: s.girthMm };
      return { size: s.name, layout: computeLayout(sized), spec: sized };
    });
    const sheet = jobSheetFromRun(run);
    const cut = sheet.steps.filter((s) => s.startsWith('Cut the blank') || s.startsWith('Cut 1 x') || s.startsWith('Cut the blanks'));
    expect(cut).toEqual(['Cut the blanks of all 5 sizes (the cut list), each along its own outline; mark each with its size.']);
    expect(sheet.cutList.map((c) => c.piece)).toEqual(RUN.map((s) => `Collar, size ${s.name}`));
    expect(sheet.steps.filter((s) => s.startsWith('Punch')).every((s) => s.includes('per strap'))).toBe(true);
    expect(sheet.punches.length).toBeGreaterThan(0);
    for (const p of sheet.punches) expect(p.what).toMatch(/per strap$/);
    for (const r of sheet.rivets) expect(r.where).toMatch(/per strap$/);
  });
});
