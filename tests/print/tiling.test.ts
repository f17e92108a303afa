import fc from 'fast-check';
import { presetSpec } from '@shared/pattern/index.ts';
import { revisionDrawing } from '../../server/modules/print/revision-drawing.ts';
import { describe, expect, it } from 'vitest';
import { PIECE_PAD_MM, buildTemplatePdf, planTemplate } from '../../server/modules/print/template-pdf.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import type { PagePlan } from '../../server/modules/print/page-plan.ts';
import { beltDrawing, collarRunDrawing, stripPiece, watchDrawing } from './fixtures.ts';
import { pageText, renderCrop, writeOut } from './pdf-tools.ts';

/** Length of the blank [0, L] each sheet shows, summed, minus the overlaps that fall on it. */
function coveredLength(plan: PagePlan, pieceIndex: number, lengthMm: number): number {
  let sum = 0;
  for (const page of plan.pages) {
    for (const pl of page.placements) {
      if (pl.pieceIndex !== pieceIndex) continue;
      sum += Math.max(0, Math.min(lengthMm, pl.toXMm) - Math.max(0, pl.fromXMm));
    }
  }
  for (const s of plan.seams) {
    const onPiece = plan.pages.find((p) => p.number === s.rightPage)?.placements.some((pl) => pl.pieceIndex === pieceIndex);
    if (onPiece) sum -= Math.max(0, Math.min(lengthMm, s.overlapToMm) - Math.max(0, s.overlapFromMm));
  }
  return sum;
}

describe('tiling long straps across sheets', () => {
  it('when a 48 in belt (1219.2 mm) tiles on Letter, then the tiles minus overlaps add up to the blank within 0.1 mm', () => {
    const d = beltDrawing();
    const plan = planTemplate(d, parsePrintOptions({ paper: 'letter', overlap: '12mm' }));
    expect(plan.pages.length).toBeGreaterThan(1);
    expect(Math.abs(coveredLength(plan, 0, 1219.2) - 1219.2)).toBeLessThan(0.1);
  });

  it('when any blank length, paper, margin and overlap are drawn, then the tiles minus overlaps equal the blank within 0.1 mm (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 2400, noNaN: true }),
        fc.constantFrom('letter', 'legal', 'tabloid', 'a4', 'a3'),
        fc.double({ min: 0, max: 15, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.constantFrom('auto', 'portrait', 'landscape'),
        (len, paper, margin, overlap, orientation) => {
          const d = { title: beltDrawing().title, pieces: [stripPiece('s', 'strip', len, 25, [])] };
          const plan = planTemplate(d, parsePrintOptions({ paper, margin, overlap, orientation }));
          // Consecutive sheets overlap by exactly the option (seam bounds in datum mm).
          for (const s of plan.seams) expect(s.overlapToMm - s.overlapFromMm).toBeCloseTo(overlap, 9);
          expect(Math.abs(coveredLength(plan, 0, len) - len)).toBeLessThan(0.1);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('when a five-size collar run prints on Letter, then the sizes share sheets in rows instead of one run of sheets each', () => {
    const d = collarRunDrawing();
    const plan = planTemplate(d, parsePrintOptions({ paper: 'letter' }));
    const oneEach = d.pieces.reduce((n, p) => n + planTemplate({ ...d, pieces: [p] }, parsePrintOptions({ paper: 'letter' })).pages.length, 0);
    expect(plan.pages.length).toBeLessThan(oneEach);
    for (const [i, p] of d.pieces.entries()) expect(Math.abs(coveredLength(plan, i, p.lengthMm) - p.lengthMm)).toBeLessThan(0.1);
  });
});

// Join marks are printed in one colour (#b0006a); find the columns where they are drawn.
function markColumnsMm(g: { width: number; height: number }, dpi: number, rgb: Buffer): number[] {
  const cols: number[] = [];
  for (let x = 0; x < g.width; x++) {
    let n = 0;
    for (let y = 0; y < g.height; y++) {
      const i = (y * g.width + x) * 3;
      if ((rgb[i] ?? 0) > 140 && (rgb[i + 1] ?? 255) < 60 && (rgb[i + 2] ?? 0) > 70) n++;
    }
    // A dashed mark line through a row is many pixels tall; text in the mark colour is a few.
    if (n > 30) cols.push(((x + 0.5) / dpi) * 25.4);
  }
  return cols;
}

describe('packing small pieces', () => {
  it('when a belt comes with a keeper, then the keeper is packed under the belt on one of its sheets, labelled, not on a sheet of its own', async () => {
    const belt = beltDrawing();
    const d = { ...belt, pieces: [...belt.pieces, stripPiece('keeper', 'Keeper for the belt', 110, 12.7, [])] };
    const options = parsePrintOptions({ paper: 'letter' });
    const plan = planTemplate(d, options);
    const alone = planTemplate(belt, options);
    expect(plan.pages.length).toBe(alone.pages.length);
    const host = plan.pages.find((p) => p.placements.some((pl) => pl.pieceIndex === 1));
    expect(host?.run).toBeDefined();
    const path = writeOut('belt-keeper.pdf', await buildTemplatePdf({ drawing: d, options }));
    expect(pageText(path, host?.number ?? 0)).toContain('Keeper for the belt · blank');
  });

  it('when a watch strap (120 and 75 mm pieces, common practice) prints on A4, then both pieces share one sheet', () => {
    const plan = planTemplate(watchDrawing(), parsePrintOptions({ paper: 'a4' }));
    expect(plan.pages.length).toBe(1);
    expect(plan.pages[0]?.placements.map((p) => p.pieceIndex).sort()).toEqual([0, 1]);
  });
});

describe('seam marks and margins on the printed sheets', () => {
  it('when the belt prints, then every seam mark has its partner on the next sheet at the same datum distance, and each sheet names its joins', async () => {
    const { execFileSync } = await import('node:child_process');
    const d = beltDrawing();
    const options = parsePrintOptions({ paper: 'letter' });
    const plan = planTemplate(d, options);
    const path = writeOut('belt-seams.pdf', await buildTemplatePdf({ drawing: d, options }));
    const dpi = 100;
    const marks = plan.pages.map((p) => {
      const ppm = execFileSync('pdftoppm', ['-r', String(dpi), '-f', String(p.number), '-l', String(p.number), '-aa', 'no', '-aaVector', 'no', path], { maxBuffer: 1 << 27 });
      // P6 header: "P6\nW H\n255\n"
      const header = ppm.subarray(0, 30).toString('latin1').split(/\s+/);
      const width = Number(header[1]);
      const height = Number(header[2]);
      const start = ppm.length - width * height * 3;
      const area = plan.frame.area;
      const rows = { minY: Math.round((area.minY / 25.4) * dpi), maxY: Math.round((area.maxY / 25.4) * dpi) };
      const sub = ppm.subarray(start + rows.minY * width * 3, start + rows.maxY * width * 3);
      return markColumnsMm({ width, height: rows.maxY - rows.minY }, dpi, sub);
    });
    expect(plan.seams.length).toBe(plan.pages.length - 1);
    for (const s of plan.seams) {
      const left = plan.pages[s.leftPage - 1];
      const right = plan.pages[s.rightPage - 1];
      const offL = left?.placements[0]?.offsetXMm ?? NaN;
      const offR = right?.placements[0]?.offsetXMm ?? NaN;
      // The mark seen on each sheet, mapped back to mm from the buckle-end datum.
      const seenL = (marks[s.leftPage - 1] ?? []).map((x) => x - offL).filter((x) => Math.abs(x - s.markXMm) < 2);
      const seenR = (marks[s.rightPage - 1] ?? []).map((x) => x - offR).filter((x) => Math.abs(x - s.markXMm) < 2);
      expect(seenL.length).toBeGreaterThan(0);
      expect(seenR.length).toBeGreaterThan(0);
      // One pixel at 100 dpi is 0.254 mm.
      expect(Math.abs((seenL[0] ?? 0) - (seenR[0] ?? 0))).toBeLessThan(0.3);
      expect(pageText(path, s.leftPage)).toContain(`right: marks ${s.letter} join page ${s.rightPage}`);
      expect(pageText(path, s.rightPage)).toContain(`left: marks ${s.letter} join page ${s.leftPage}`);
      expect(pageText(path, s.rightPage)).toContain(`${s.rightPage} of ${plan.pages.length}`);
    }
  });

  it('when a strap fills the sheet to its edges, or the belt preset prints with its labels, then no ink falls inside the margins', async () => {
    const tall = { title: beltDrawing().title, pieces: [stripPiece('s', 'Tall strap', 1500, 120, [200, 400, 1400], 100)] };
    const preset = revisionDrawing(presetSpec('belt'), {}, { patternName: 'Belt for Tobias Harrow', revision: 1, date: '2026-12-01' }).drawing;
    for (const [paper, margin, d] of [['letter', '0.25in', tall], ['a4', '10mm', tall], ['letter', '6mm', preset]] as const) {
      const options = parsePrintOptions({ paper, margin });
      const plan = planTemplate(d, options);
      const path = writeOut(`margins-${paper}-${margin}.pdf`, await buildTemplatePdf({ drawing: d, options }));
      const dpi = 150;
      const m = options.marginMm;
      for (const p of plan.pages) {
        const g = renderCrop(path, p.number, dpi);
        const px = (mm: number) => (mm / 25.4) * dpi;
        // Look one pixel inside the margin line: the margin is whatever lies outside it.
        const inner = { x0: px(m) - 1, y0: px(m) - 1, x1: g.width - px(m) + 1, y1: g.height - px(m) + 1 };
        let ink = 0;
        for (let y = 0; y < g.height; y++) {
          for (let x = 0; x < g.width; x++) {
            const inMargin = x < inner.x0 || x >= inner.x1 || y < inner.y0 || y >= inner.y1;
            if (inMargin && (g.data[y * g.width + x] ?? 255) < 250) ink++;
          }
        }
        expect(ink, `${paper} page ${p.number}`).toBe(0);
      }
    }
    expect(PIECE_PAD_MM).toBeGreaterThan(0);
  });
});
