import { execFileSync } from 'node:child_process';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import type { Drawing } from '@shared/render/drawing.ts';
import { buildTemplatePdf } from '../../server/modules/print/template-pdf.ts';
import { parsePrintOptions } from '../../server/modules/print/print-options.ts';
import { collarDrawing, watchDrawing } from './fixtures.ts';
import { pageText, renderCrop, writeOut } from './pdf-tools.ts';

/** A drawing whose only piece carries one big label, to render a glyph on its own. */
function labelDrawing(text: string): Drawing {
  const d = watchDrawing();
  const piece = { ...d.pieces[0]!, items: [{ type: 'text' as const, layer: 'label' as const, x: 10, y: 0, text, sizeMm: 8, anchor: 'start' as const }] };
  return { ...d, pieces: [piece] };
}

describe('embedded fonts', () => {
  it('when a template is built, then pdffonts lists IBM Plex Sans regular and semibold as embedded subsets (poppler pdffonts)', async () => {
    const path = writeOut('fonts.pdf', await buildTemplatePdf({ drawing: collarDrawing(), options: parsePrintOptions({ paper: 'letter' }) }));
    const rows = execFileSync('pdffonts', [path], { encoding: 'utf8' }).split('\n').slice(2).filter(Boolean);
    const plex = rows.filter((r) => /IBMPlexSans-(Regular|SemiBold)/.test(r));
    expect(plex.length).toBe(2);
    // Columns: name type encoding emb sub uni object ID; every font embedded, none substituted.
    for (const r of rows) expect(r.split(/\s+/)[4], r).toBe('yes');
    expect(rows.length).toBe(plex.length);
  });

  it('when a label says 1/8 as the single glyph U+215B and as 3/16 in ASCII, then both render and read back (Plex has the glyph; pdftotext reads ToUnicode)', async () => {
    const eighth = writeOut('eighth.pdf', await buildTemplatePdf({ drawing: labelDrawing('⅛ 3/16'), options: parsePrintOptions({ paper: 'a4' }) }));
    // U+2610 is not in Plex: it renders as the font's .notdef box, the failure we guard against.
    const missing = writeOut('notdef.pdf', await buildTemplatePdf({ drawing: labelDrawing('☐ 3/16'), options: parsePrintOptions({ paper: 'a4' }) }));
    expect(pageText(eighth, 1)).toContain('⅛ 3/16');
    const crop = (p: string) => {
      const g = renderCrop(p, 1, 300, { minX: 14, maxX: 40, minY: 0, maxY: 40 });
      return Buffer.from(g.data);
    };
    const a = crop(eighth);
    const b = crop(missing);
    const dark = (buf: Buffer) => buf.reduce((n, v) => n + (v < 128 ? 1 : 0), 0);
    expect(dark(a)).toBeGreaterThan(200);
    expect(a.equals(b)).toBe(false);
  });
});

describe('deterministic output', () => {
  it('when the same drawing and options are printed twice, then the bytes are identical (fixed metadata dates, ISO 32000-1 /ID from them)', async () => {
    const options = parsePrintOptions({ paper: 'letter', jobSheet: true });
    const date = new Date('2026-11-30T10:00:00Z');
    const a = await buildTemplatePdf({ drawing: collarDrawing(), options, date });
    const b = await buildTemplatePdf({ drawing: collarDrawing(), options, date });
    expect(a.equals(b)).toBe(true);
  });

  it('when the revision date differs, then the bytes differ (the date is really written)', async () => {
    const options = parsePrintOptions({ paper: 'letter' });
    const a = await buildTemplatePdf({ drawing: collarDrawing(), options, date: new Date('2026-11-30T10:00:00Z') });
    const b = await buildTemplatePdf({ drawing: collarDrawing(), options, date: new Date('2026-12-01T10:00:00Z') });
    expect(a.equals(b)).toBe(false);
    const meta = await PDFDocument.load(a, { updateMetadata: false });
    expect(meta.getCreationDate()?.toISOString()).toBe('2026-11-30T10:00:00.000Z');
    expect(meta.getModificationDate()?.toISOString()).toBe('2026-11-30T10:00:00.000Z');
  });
});
