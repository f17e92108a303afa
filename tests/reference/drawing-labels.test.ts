// Labels of every preset's drawing: none overlaps another or the cut outline, the Drawing's
// bounds hold them all, and the engine's font-free width estimate is never narrower than
// IBM Plex Sans really sets them (pdfkit measuring the TTFs in fonts/, the fonts PDFs embed).
import { fileURLToPath } from 'node:url';
import PDFDocument from 'pdfkit';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, PRESET_NAMES } from '@shared/pattern/index.ts';
import { textBoxMm, textLengthMm } from '@shared/pattern/draw-labels.ts';
import type { BoxMm, DrawingPiece, TextItem } from '@shared/render/drawing.ts';
import { pageFrame } from '../../server/modules/print/page-frame.ts';
import { ROW, rowHeightMm } from '../../server/modules/print/pack.ts';
import { paperSize } from '../../server/modules/print/paper.ts';
import { planPieces } from '../../server/modules/print/template-pdf.ts';

const font = (f: string) => fileURLToPath(new URL(`../../fonts/${f}`, import.meta.url));
const doc = new PDFDocument({ autoFirstPage: false });
doc.registerFont('regular', font('IBMPlexSans-Regular.ttf'));
doc.registerFont('bold', font('IBMPlexSans-SemiBold.ttf'));
/** Real advance width (mm) of a label at its em size, from the font's own metrics. */
function plexWidthMm(t: TextItem): number {
  doc.font(t.weight === 'bold' ? 'bold' : 'regular').fontSize(1000);
  return (doc.widthOfString(t.text) / 1000) * t.sizeMm;
}

const texts = (p: DrawingPiece) => p.items.filter((i): i is TextItem => i.type === 'text');
const overlap = (a: BoxMm, b: BoxMm) => a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;
const drawn = PRESET_NAMES.flatMap((name) => {
  const s = presetSpec(name);
  return drawLayout(computeLayout(s), s).pieces.map((piece) => ({ name, piece }));
});

describe('drawing labels', () => {
  for (const { name, piece } of drawn) {
    it(`when the ${name} preset's ${piece.id} is drawn, then no two labels overlap and none crosses the blank`, () => {
      const boxes = texts(piece).map((t) => ({ t: t.text, b: textBoxMm(t) }));
      expect(boxes.length).toBeGreaterThan(3);
      for (let i = 0; i < boxes.length; i++) {
        for (let j = i + 1; j < boxes.length; j++) expect(overlap(boxes[i]!.b, boxes[j]!.b), `${boxes[i]!.t} / ${boxes[j]!.t}`).toBe(false);
        // The blank occupies 0..length by -w/2..w/2 (the widest width): labels keep out of it.
        const blank = { minX: 0, maxX: piece.lengthMm, minY: -piece.widthMm / 2, maxY: piece.widthMm / 2 };
        expect(overlap(boxes[i]!.b, blank), boxes[i]!.t).toBe(false);
      }
    });

    it(`when the ${name} preset's ${piece.id} is drawn, then its bounds hold every label as IBM Plex Sans sets it (pdfkit, fonts/)`, () => {
      for (const t of texts(piece)) {
        const real = plexWidthMm(t);
        // The estimate (0.6 em a character) is conservative: never narrower than the font.
        expect(textLengthMm(t.text, t.sizeMm), t.text).toBeGreaterThanOrEqual(real);
        const b = textBoxMm(t);
        expect(b.minX).toBeGreaterThanOrEqual(piece.bounds.minX - 1e-9);
        expect(b.maxX).toBeLessThanOrEqual(piece.bounds.maxX + 1e-9);
        expect(b.minY).toBeGreaterThanOrEqual(piece.bounds.minY - 1e-9);
        expect(b.maxY).toBeLessThanOrEqual(piece.bounds.maxY + 1e-9);
      }
    });
  }

  it('when the collar is printed, then its row (caption, drawing, datum ruler) is under 90 mm and two rows share a Letter landscape sheet (ASME Y14.1: 8 1/2 x 11 in)', () => {
    const s = presetSpec('collar');
    const [row] = planPieces(drawLayout(computeLayout(s), s));
    const h = rowHeightMm(row!);
    expect(h).toBeLessThan(90);
    const area = pageFrame(paperSize('letter'), 'landscape', 6).area;
    expect(2 * h + ROW.gapMm).toBeLessThanOrEqual(area.maxY - area.minY);
  });
});
