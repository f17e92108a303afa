// A size run that grades the width (and holes, hardware) per size prints each size at its own
// width, and every sheet's title block names the sizes on that sheet (read back with pdftotext).
import { describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { presetSpec } from '@shared/pattern/index.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { printRevisionInline } from '../../server/modules/print/index.ts';
import { pageText, writeOut } from './pdf-tools.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)

// Five collar sizes 2 in apart (common practice for dog collar sizing steps); the small ones
// narrower and the large ones wider, as a shop grades them (a 10 in and an 18 in collar are not
// both 1 in wide); the smallest with three holes 1/2 in apart.
const RUN: StrapSpec['sizes'] = [
  { name: 'XS', girthMm: 10 * IN, widthMm: 0.75 * IN, holes: { count: 3, spacingMm: 0.5 * IN } },
  { name: 'S', girthMm: 12 * IN, widthMm: 0.875 * IN },
  { name: 'M', girthMm: 14 * IN },
  { name: 'L', girthMm: 16 * IN, widthMm: 1.25 * IN },
  { name: 'XL', girthMm: 18 * IN, widthMm: 1.5 * IN, hardware: { buckleInsideWidthMm: 1.5 * IN } },
];

describe('a graded size run in print', () => {
  it('when a five-size collar run with graded widths prints on Letter, then every sheet names its own sizes and their widths in its title block', async () => {
    const spec: StrapSpec = { ...presetSpec('collar'), sizes: RUN };
    const f = await printRevisionInline(spec, { paper: 'letter', size: 'all' }, { patternName: 'Collar run', revision: 2, date: '2026-12-01T09:00:00Z', sizes: RUN });
    const path = writeOut('graded-run.pdf', f.body);
    const pages = (await PDFDocument.load(f.body)).getPageCount();
    expect(pages).toBeGreaterThan(1);
    const named = new Set<string>();
    for (let n = 1; n <= pages; n++) {
      const text = pageText(path, n);
      // The title block's size row: the sizes whose pieces are on this sheet, and no other.
      const onSheet = RUN.filter((z) => new RegExp(`Collar, size ${z.name}\\b`).test(text)).map((z) => z.name);
      expect(onSheet.length, `page ${n}`).toBeGreaterThan(0);
      const row = /size\s+([A-Z, ]+?)\s{2,}|size\s+([A-Z, ]+)$/m.exec(text);
      expect(row, `page ${n} has a size row:\n${text}`).not.toBeNull();
      // Named smallest first, as the run is graded.
      expect((row![1] ?? row![2])!.split(',').map((s) => s.trim())).toEqual(onSheet);
      const girths = /girth\s+(\d+) in(?: to (\d+) in)?/.exec(text);
      expect(Number(girths![2] ?? girths![1])).toBeGreaterThanOrEqual(Number(girths![1]));
      onSheet.forEach((z) => named.add(z));
    }
    expect([...named].sort()).toEqual(RUN.map((z) => z.name).sort());
  });

  it('when the run prints, then each size is drawn at its graded width (the caption reads blank length x width)', async () => {
    const spec: StrapSpec = { ...presetSpec('collar'), sizes: RUN };
    const f = await printRevisionInline(spec, { format: 'svg', size: 'all' } as never, { patternName: 'Collar run', revision: 2, date: '2026-12-01T09:00:00Z', sizes: RUN }, 'svg');
    const svg = f.body.toString('utf8');
    // Caption of each size's strap: "Collar: 18 in x 3/4 in blank" (blank = neck + 8 in, common practice).
    for (const [neck, width] of [[10, '3/4'], [12, '7/8'], [14, '1'], [16, '1 1/4'], [18, '1 1/2']] as const) expect(svg).toContain(`Collar: ${neck + 8} in x ${width} in blank`);
  });
});
