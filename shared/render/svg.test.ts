// The direct SVG writer (svg.ts) against the reference: the same Drawing built as a tree with
// svg.js over a DOM (happy-dom here; svgdom made the golden files) and written by serializeXml.
import fc from 'fast-check';
import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, parseSpec, presetSpec, PRESET_NAMES } from '../pattern/index.ts';
import type { Drawing, DrawingItem, DrawingPiece } from './drawing.ts';
import { renderPieceSvg, renderSvg } from './svg.ts';
import { renderPieceSvgViaDom, renderSvgViaDom } from './svg-via-dom.ts';

const w = new Window();
const dom = { window: w, document: w.document };

function drawingOf(name: (typeof PRESET_NAMES)[number]): Drawing {
  const spec = parseSpec(presetSpec(name));
  return drawLayout(computeLayout(spec), spec, { revision: 'rev 2', date: '2026-12-01' });
}

/** Random text: XML specials, quotes, control characters, astral and lone surrogates, empty. */
const textArb = fc.oneof(fc.string({ unit: 'binary', maxLength: 16 }), fc.constantFrom('', '<&>"\'', 'a\tb\nc\rd', '\u0001\u0008', '😀 Ø1/8 in'));
const numArb = fc.double({ min: -2000, max: 2000, noNaN: true });
const itemArb: fc.Arbitrary<DrawingItem> = fc.oneof(
  fc.record({ type: fc.constant('text' as const), layer: fc.constant('label' as const), x: numArb, y: numArb, text: textArb, sizeMm: fc.double({ min: 0.5, max: 9, noNaN: true }), anchor: fc.constantFrom('start' as const, 'middle' as const, 'end' as const), rotateDeg: fc.option(numArb, { nil: undefined }), weight: fc.option(fc.constantFrom('regular' as const, 'bold' as const), { nil: undefined }) }, { requiredKeys: ['type', 'layer', 'x', 'y', 'text', 'sizeMm', 'anchor'] }),
  fc.record({ type: fc.constant('circle' as const), layer: fc.constantFrom('punch' as const, 'cut' as const), cx: numArb, cy: numArb, r: fc.double({ min: 0, max: 20, noNaN: true }) }),
  fc.record({ type: fc.constant('path' as const), layer: fc.constantFrom('guide' as const, 'fold' as const, 'cut' as const, 'punch' as const, 'label' as const), commands: fc.array(fc.oneof(fc.record({ op: fc.constant('M' as const), x: numArb, y: numArb }), fc.record({ op: fc.constant('L' as const), x: numArb, y: numArb }), fc.record({ op: fc.constant('C' as const), x1: numArb, y1: numArb, x2: numArb, y2: numArb, x: numArb, y: numArb }), fc.constant({ op: 'Z' as const })), { maxLength: 5 }), dashed: fc.option(fc.boolean(), { nil: undefined }) }, { requiredKeys: ['type', 'layer', 'commands'] }),
);
const pieceArb: fc.Arbitrary<DrawingPiece> = fc.record({ id: textArb, name: textArb, items: fc.array(itemArb, { maxLength: 8 }), a: numArb, b: numArb }).map((p) => ({
  id: p.id,
  name: p.name,
  lengthMm: Math.abs(p.a) + 1,
  widthMm: Math.abs(p.b) + 1,
  bounds: { minX: Math.min(p.a, p.b), minY: -Math.abs(p.b), maxX: Math.max(p.a, p.b) + 1, maxY: Math.abs(p.b) + 1 },
  items: p.items,
}));

describe('renderSvg writes what svg.js over a DOM serialises', () => {
  it('when each preset is rendered with and without the title block, then the bytes equal the DOM renderer', () => {
    for (const name of PRESET_NAMES) {
      const d = drawingOf(name);
      expect(renderSvg(d, dom), name).toBe(renderSvgViaDom(d, dom));
      expect(renderSvg(d, dom, { titleBlock: false, marginMm: 2 }), name).toBe(renderSvgViaDom(d, dom, { titleBlock: false, marginMm: 2 }));
      for (const p of d.pieces) for (const extent of ['blank', 'all'] as const) expect(renderPieceSvg(p, dom, { extent })).toBe(renderPieceSvgViaDom(p, dom, { extent }));
    }
  });

  it('when random drawings (odd text, empty pieces, no pieces) are rendered, then the bytes equal the DOM renderer', () => {
    fc.assert(
      fc.property(fc.array(pieceArb, { maxLength: 3 }), fc.boolean(), textArb, (pieces, titleBlock, pattern) => {
        const d: Drawing = { ...drawingOf('keeper'), pieces };
        d.title = { ...d.title, pattern };
        expect(renderSvg(d, dom, { titleBlock })).toBe(renderSvgViaDom(d, dom, { titleBlock }));
      }),
      { numRuns: 300, seed: 20261203 },
    );
  });
});
