// What a maker reads off the sheets beside the drawing: page counts that match the stack
// out of the printer, an assembly map naming each row, seam marks clear of the datum ruler,
// and job-sheet steps that hold for every size of a run.
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from '@shared/pattern/index.ts';
import { jobSheetFromRun } from '../../server/modules/print/job-sheet-from-layout.ts';
import { ROW } from '../../server/modules/print/pack.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import { printRevisionInline } from '../../server/modules/print/index.ts';
import { buildTemplatePdf, planTemplate } from '../../server/modules/print/template-pdf.ts';
import { beltDrawing } from './fixtures.ts';
import { pageSizesPt, pageText, writeOut } from './pdf-tools.ts';

const IN = 25.4; // mm per inch, exact (International Yard and Pound Agreement, 1959)
// Five collar girths 10-18 in, 2 in apart (common practice for a graded run).
const RUN = ['XS', 'S', 'M', 'L', 'XL'].map((name, i) => ({ name, girthMm: (10 + 2 * i) * IN }));
const META = { patternName: "Juniper's collar", revision: 4, date: '2026-12-01', sizes: RUN };

describe('page furniture', () => {
  it('when a size run prints with its job sheet, then every sheet counts the job sheet in "Page n of N", N is the PDF page count (pdf-lib), and page 1 maps each size and the job sheet', async () => {
    const f = await printRevisionInline(presetSpec('collar'), { paper: 'letter', size: 'all', jobSheet: true }, META);
    const path = writeOut('furniture-run.pdf', f.body);
    const n = (await pageSizesPt(f.body)).length;
    for (let p = 1; p <= n; p++) expect(pageText(path, p), `page ${p}`).toContain(`Page ${p} of ${n}`);
    expect(pageText(path, n)).toMatch(/job sheet/);
    const first = pageText(path, 1);
    expect(first).toContain('job sheet');
    // Map rows are named by what differs between the run's pieces: the size.
    for (const s of RUN) expect(first).toMatch(new RegExp(`(^|\\s)${s.name}(\\s|$)`, 'm'));
  });

  it('when the belt tiles across sheets, then no seam-mark ink falls on the datum ruler strip of any row (poppler render, 100 dpi, antialiasing off)', async () => {
    const d = beltDrawing();
    const options = parsePrintOptions({ paper: 'letter' });
    const plan = planTemplate(d, options);
    const path = writeOut('furniture-seams.pdf', await buildTemplatePdf({ drawing: d, options }));
    const dpi = 100;
    const px = (mm: number) => Math.round((mm / IN) * dpi);
    let checked = 0;
    let seamPixelsAbove = 0;
    for (const page of plan.pages) {
      if (!page.seamLeft && !page.seamRight) continue;
      const ppm = execFileSync('pdftoppm', ['-r', String(dpi), '-f', String(page.number), '-l', String(page.number), '-aa', 'no', '-aaVector', 'no', path], { maxBuffer: 1 << 27 });
      const [, w, h] = ppm.subarray(0, 30).toString('latin1').split(/\s+/).map(Number);
      const width = w ?? 0;
      const data = ppm.subarray(ppm.length - width * (h ?? 0) * 3);
      // The seam colour #b0006a: strong red and blue, almost no green.
      const seam = (x: number, y: number) => {
        const i = (y * width + x) * 3;
        return (data[i] ?? 0) > 130 && (data[i + 1] ?? 255) < 60 && (data[i + 2] ?? 0) > 60;
      };
      for (const pl of page.placements.filter((p) => p.tile)) {
        // The ruler line sits 1 mm below the top of its strip (datum-ruler.ts); start just above it.
        const rulerTop = px(pl.clip.maxY - ROW.rulerMm + 0.8);
        for (let y = rulerTop; y < px(pl.clip.maxY); y++) for (let x = 0; x < width; x++) expect(seam(x, y), `page ${page.number} (${x}, ${y})`).toBe(false);
        for (let y = px(pl.clip.minY); y < rulerTop; y++) for (let x = 0; x < width; x++) if (seam(x, y)) seamPixelsAbove++;
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
    // The marks are still there, above the ruler (the test cannot pass on a page without them).
    expect(seamPixelsAbove).toBeGreaterThan(100);
  });

  it('when a job sheet covers a five-size run, then its cutting step names no single blank length and the punch step counts per strap', () => {
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
  });
});
