import { describe, expect, it } from 'vitest';
import { buildTemplatePdf } from '../../server/modules/print/template-pdf.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import { watchDrawing } from './fixtures.ts';
import { pageSizesPt } from './pdf-tools.ts';

// Expected sizes in points: inches x 72 (ISO 32000-1, 8.3.2.1: 1 pt = 1/72 in) and
// mm x 72 / 25.4 (1 in = 25.4 mm, International Yard and Pound Agreement 1959).
const CASES = [
  { paper: 'letter', w: 612, h: 792, source: 'ASME Y14.1 size A, 8.5 x 11 in' },
  { paper: 'legal', w: 612, h: 1008, source: 'North American Legal 8.5 x 14 in (common practice)' },
  { paper: 'tabloid', w: 792, h: 1224, source: 'ASME Y14.1 size B, 11 x 17 in' },
  { paper: 'a4', w: 595.28, h: 841.89, source: 'ISO 216 A4, 210 x 297 mm' },
  { paper: 'a3', w: 841.89, h: 1190.55, source: 'ISO 216 A3, 297 x 420 mm' },
] as const;

describe('page sizes read back with pdf-lib', () => {
  for (const c of CASES) {
    it(`when printing on ${c.paper} portrait, then every page is ${c.w} x ${c.h} pt (${c.source})`, async () => {
      const pdf = await buildTemplatePdf({ drawing: watchDrawing(), options: parsePrintOptions({ paper: c.paper, orientation: 'portrait' }) });
      const sizes = await pageSizesPt(pdf);
      expect(sizes.length).toBeGreaterThan(0);
      for (const s of sizes) {
        expect(s.width).toBeCloseTo(c.w, 2);
        expect(s.height).toBeCloseTo(c.h, 2);
      }
    });
  }

  it('when landscape is asked for on A4, then width and height swap (ISO 216 A4 at 90 degrees)', async () => {
    const pdf = await buildTemplatePdf({ drawing: watchDrawing(), options: parsePrintOptions({ paper: 'a4', orientation: 'landscape' }) });
    const [s] = await pageSizesPt(pdf);
    expect(s?.width).toBeCloseTo(841.89, 2);
    expect(s?.height).toBeCloseTo(595.28, 2);
  });

  it('when a custom 24 in x 2 m roll is given, then the page is 1728 x 5669.29 pt or its landscape turn (in x 72, mm x 72 / 25.4)', async () => {
    const pdf = await buildTemplatePdf({ drawing: watchDrawing(), options: parsePrintOptions({ paper: 'custom', width: '24in', length: '2000mm' }) });
    const [s] = await pageSizesPt(pdf);
    const sides = [s?.width ?? 0, s?.height ?? 0].sort((a, b) => a - b);
    expect(sides[0]).toBeCloseTo(1728, 2);
    expect(sides[1]).toBeCloseTo(5669.29, 2);
  });
});
