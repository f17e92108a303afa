import { describe, expect, it } from 'vitest';
import { squareBoxes, SQUARES } from '../../server/modules/print/calibration.ts';
import { buildTemplatePdf, planTemplate } from '../../server/modules/print/template-pdf.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import { collarDrawing, watchDrawing } from './fixtures.ts';
import { darkSpan, pageSizesPt, renderCrop, writeOut } from './pdf-tools.ts';
import { presetSpec } from '@shared/pattern/index.ts';
import { printRevisionInline } from '../../server/modules/print/index.ts';
import { pageFrame } from '../../server/modules/print/page-frame.ts';

const DPI = 1200;
// A ruler's reading at 1200 dpi: 1 in = 1200 px; 25 mm = 25 / 25.4 x 1200 = 1181.10 px
// (1 in = 25.4 mm, International Yard and Pound Agreement 1959). Tolerance 0.1 %.
const EXPECTED_PX = SQUARES.map((s) => (s.sideMm / 25.4) * DPI);

async function measureSquares(name: string, drawing: Drawing, paper: string) {
  const options = parsePrintOptions({ paper });
  const plan = planTemplate(drawing, options);
  const path = writeOut(`${name}-scale.pdf`, await buildTemplatePdf({ drawing, options }));
  const out: { page: number; square: number; widthPx: number; heightPx: number }[] = [];
  for (const page of plan.pages) {
    squareBoxes(plan.frame.band).forEach((b, i) => {
      // Crop 1.5 mm round the square: clear of the instruction text above it.
      const pad = 1.5;
      const g = renderCrop(path, page.number, DPI, { minX: b.minX - pad, maxX: b.maxX + pad, minY: b.minY - pad, maxY: b.maxY + pad });
      // Read the outer edge to edge through the middle, where only the ring's two sides are dark.
      const row = darkSpan(g, 'row', Math.round(g.height / 2));
      const col = darkSpan(g, 'col', Math.round(g.width / 2) - Math.round(g.width / 4));
      out.push({ page: page.number, square: i, widthPx: row ? row.last - row.first + 1 : 0, heightPx: col ? col.last - col.first + 1 : 0 });
    });
  }
  return out;
}

describe('calibration squares measured at 1200 dpi with antialiasing off', () => {
  it('when the 21 in collar prints on Letter, then on every page the 1 in square reads 1200 px and the 25 mm square 1181.1 px within 0.1 %', async () => {
    const m = await measureSquares('collar-letter', collarDrawing(), 'letter');
    expect(m.length).toBe(2 * 3);
    for (const r of m) {
      const want = EXPECTED_PX[r.square] ?? 0;
      expect(Math.abs(r.widthPx - want) / want).toBeLessThan(0.001);
      expect(Math.abs(r.heightPx - want) / want).toBeLessThan(0.001);
    }
  });

  it('when the engine collar preset prints on Letter with its job sheet, then every page, the job sheet too, carries squares that read true within 0.1 %', async () => {
    const options = parsePrintOptions({ paper: 'letter', jobSheet: true });
    const f = await printRevisionInline(presetSpec('collar'), options, { patternName: 'Collar for Juniper', revision: 1, date: '2026-12-01' });
    const path = writeOut('preset-collar-scale.pdf', f.body);
    const sizes = await pageSizesPt(f.body);
    for (const [i, s] of sizes.entries()) {
      const landscape = s.width > s.height;
      const band = pageFrame(options.sheet, landscape ? 'landscape' : 'portrait', options.marginMm).band;
      squareBoxes(band).forEach((b, k) => {
        const g = renderCrop(path, i + 1, DPI, { minX: b.minX - 1.5, maxX: b.maxX + 1.5, minY: b.minY - 1.5, maxY: b.maxY + 1.5 });
        const row = darkSpan(g, 'row', Math.round(g.height / 2));
        const want = EXPECTED_PX[k] ?? 0;
        expect(Math.abs((row ? row.last - row.first + 1 : 0) - want) / want, `page ${i + 1} square ${k}`).toBeLessThan(0.001);
      });
    }
  });

  it('when a watch strap prints on A4, then both squares read true within 0.1 % (ISO 216 sheet)', async () => {
    const m = await measureSquares('watch-a4', watchDrawing(), 'a4');
    expect(m.length).toBe(2);
    for (const r of m) {
      const want = EXPECTED_PX[r.square] ?? 0;
      expect(Math.abs(r.widthPx - want) / want).toBeLessThan(0.001);
      expect(Math.abs(r.heightPx - want) / want).toBeLessThan(0.001);
    }
  });
});
