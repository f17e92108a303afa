import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import { pathPointBox } from './svg-path.ts';
import { buildCutterSvg, CUTTER_COLORS, HAIRLINE_MM } from '../../server/modules/print/cutter-svg.ts';
import { collarDrawing, watchDrawing } from './fixtures.ts';

function parse(svg: string): Document {
  const w = new Window();
  return new w.DOMParser().parseFromString(svg, 'image/svg+xml') as unknown as Document;
}

describe('cutter SVG', () => {
  it('when the collar is exported, then the sheet is exactly the blank (533.4 x 25.4 mm) and its outline spans it (SVG 1.1 user units = mm via viewBox)', () => {
    const d = collarDrawing();
    const doc = parse(buildCutterSvg(d));
    const svg = doc.documentElement;
    expect(svg.getAttribute('width')).toBe('533.400mm');
    expect(svg.getAttribute('height')).toBe('25.400mm');
    expect(svg.getAttribute('viewBox')).toBe('0 0 533.400 25.400');
    const outline = doc.querySelector(`g[stroke="${CUTTER_COLORS.cut}"] path`);
    const box = pathPointBox(outline?.getAttribute('d') ?? '');
    expect(box.minX).toBeCloseTo(0, 3);
    expect(box.maxX).toBeCloseTo(533.4, 3);
    expect(box.minY).toBeCloseTo(0, 3);
    expect(box.maxY).toBeCloseTo(25.4, 3);
  });

  it('when exported, then only cut and punch geometry remains: no text, no guide or fold, one colour per operation, hairline strokes', () => {
    const d = collarDrawing();
    const doc = parse(buildCutterSvg(d));
    expect(doc.querySelectorAll('text').length).toBe(0);
    const strokes = new Set([...doc.querySelectorAll('[stroke]')].map((e) => e.getAttribute('stroke')));
    expect([...strokes].sort()).toEqual([CUTTER_COLORS.cut, CUTTER_COLORS.punch].sort());
    expect(doc.querySelector('[stroke-width]')?.getAttribute('stroke-width')).toBe(HAIRLINE_MM.toFixed(3));
    const piece = d.pieces[0]!;
    const want = piece.items.filter((i) => (i.layer === 'cut' || i.layer === 'punch') && (i.type === 'circle' || (i.type === 'path' && i.commands.at(-1)?.op === 'Z'))).length;
    expect(doc.querySelectorAll('path, circle').length).toBe(want);
    // Five adjustment holes, each a circle on the punch pass.
    expect(doc.querySelectorAll(`g[stroke="${CUTTER_COLORS.punch}"] circle`).length).toBe(5);
  });

  it('when a watch strap has two pieces, then both are on the sheet with their exact lengths, stacked', () => {
    const doc = parse(buildCutterSvg(watchDrawing()));
    const svg = doc.documentElement;
    expect(svg.getAttribute('width')).toBe('120.000mm');
    expect(svg.getAttribute('height')).toBe('45.000mm');
    const outlines = [...doc.querySelectorAll(`g[stroke="${CUTTER_COLORS.cut}"] path`)].map((p) => pathPointBox(p.getAttribute('d') ?? ''));
    expect(outlines.map((b) => +(b.maxX - b.minX).toFixed(3))).toEqual([120, 75]);
  });
});

describe('full-size SVG', () => {
  it('when the collar preset is exported, then it is one sheet in physical units whose viewBox is in mm (W3C CSS: 1in = 25.4mm)', async () => {
    const { presetSpec } = await import('@shared/pattern/index.ts');
    const { printRevisionInline } = await import('../../server/modules/print/index.ts');
    const f = await printRevisionInline(presetSpec('collar'), {}, { patternName: 'Collar for Juniper', revision: 1, date: '2026-12-01' }, 'svg');
    expect(f.contentType).toBe('image/svg+xml');
    expect(f.fileName).toBe('collar-for-juniper-r1.svg');
    const svg = parse(f.body.toString('utf8')).documentElement;
    const w = /^([\d.]+)mm$/.exec(svg.getAttribute('width') ?? '')?.[1];
    const h = /^([\d.]+)mm$/.exec(svg.getAttribute('height') ?? '')?.[1];
    const vb = (svg.getAttribute('viewBox') ?? '').split(/\s+/).map(Number);
    expect(Number(w)).toBeCloseTo(vb[2] ?? NaN, 3);
    expect(Number(h)).toBeCloseTo(vb[3] ?? NaN, 3);
    // The sheet holds the whole 21 in (533.4 mm) blank.
    expect(Number(w)).toBeGreaterThan(533.4);
  });
});
