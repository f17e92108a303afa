import { JSDOM } from 'jsdom';
import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import { computeLayout, drawLayout, presetSpec, PRESET_NAMES } from '@shared/pattern/index.ts';
import { renderPieceSvg, renderSvg } from '@shared/render/svg.ts';
import { svgdomDom } from '../../server/render/svgdom-window.ts';
import type { Drawing } from '@shared/render/drawing.ts';

const happy = () => {
  const w = new Window();
  return { window: w, document: w.document };
};
const jsdom = () => {
  const d = new JSDOM('<!doctype html><html><body></body></html>');
  return { window: d.window, document: d.window.document };
};
/** Parses as XML with jsdom's DOMParser (an independent, standards-following parser). */
const parseXml = (s: string) => new (new JSDOM('').window.DOMParser)().parseFromString(s, 'application/xml');
const drawingOf = (name: (typeof PRESET_NAMES)[number]) => {
  const s = presetSpec(name);
  return drawLayout(computeLayout(s), s);
};

describe('renderSvg', () => {
  it('when every preset is rendered, then the SVG is well-formed XML (jsdom DOMParser reports no parsererror)', () => {
    for (const name of PRESET_NAMES) {
      const doc = parseXml(renderSvg(drawingOf(name), svgdomDom()));
      expect(doc.getElementsByTagName('parsererror').length, name).toBe(0);
      expect(doc.documentElement.namespaceURI).toBe('http://www.w3.org/2000/svg');
    }
  });

  it('when the same drawing is rendered over svgdom, happy-dom and jsdom, then the bytes are identical', () => {
    for (const name of PRESET_NAMES) {
      const d = drawingOf(name);
      const a = renderSvg(d, svgdomDom());
      expect(renderSvg(d, happy()), name).toBe(a);
      expect(renderSvg(d, jsdom()), name).toBe(a);
    }
  });

  it('when a piece is rendered to its blank, then width/height are the blank in mm and the viewBox matches', () => {
    const piece = drawingOf('collar').pieces[0]!;
    const doc = parseXml(renderPieceSvg(piece, svgdomDom(), { extent: 'blank' }));
    const root = doc.documentElement;
    expect(root.getAttribute('width')).toBe('533.400mm'); // 21 in x 25.4
    expect(root.getAttribute('height')).toBe('25.400mm');
    expect(root.getAttribute('viewBox')).toBe('0.000 -12.700 533.400 25.400');
  });

  it('when the whole drawing is rendered, then width/height in mm equal the viewBox extent and contain the blank', () => {
    const doc = parseXml(renderSvg(drawingOf('collar'), svgdomDom()));
    const root = doc.documentElement;
    const [, , vw, vh] = root.getAttribute('viewBox')!.split(' ').map(Number);
    expect(root.getAttribute('width')).toBe(`${vw!.toFixed(3)}mm`);
    expect(root.getAttribute('height')).toBe(`${vh!.toFixed(3)}mm`);
    expect(vw!).toBeGreaterThan(533.4);
  });

  it('when a label holds </text><script> and &, then it comes out escaped, adds no element and round-trips', () => {
    const nasty = 'Juniper </text><script>alert(1)</script> & "Bosun" <b>';
    const d: Drawing = { ...drawingOf('collar'), title: { ...drawingOf('collar').title, pattern: nasty } };
    const svg = renderSvg(d, svgdomDom());
    expect(svg).not.toContain('<script>');
    expect(svg).toContain('&lt;/text&gt;&lt;script&gt;');
    expect(svg).toContain('&amp;');
    const doc = parseXml(svg);
    expect(doc.getElementsByTagName('script').length).toBe(0);
    const texts = [...doc.getElementsByTagName('text')].map((t) => t.textContent);
    expect(texts).toContain(`Latchet pattern: ${nasty}`);
  });

  it('when numbers are written, then every coordinate has exactly three decimals', () => {
    const svg = renderSvg(drawingOf('watch-strap'), svgdomDom());
    const d = [...svg.matchAll(/ d="([^"]+)"/g)].map((m) => m[1]!).join(' ');
    const nums = d.match(/-?\d+(\.\d+)?/g)!;
    expect(nums.length).toBeGreaterThan(100);
    for (const x of nums) expect(x).toMatch(/^-?\d+\.\d{3}$/);
  });

  it('when rendered, then each piece has one group per layer with ids and classes', () => {
    const doc = parseXml(renderSvg(drawingOf('watch-strap'), svgdomDom()));
    for (const id of ['piece-long-cut', 'piece-long-punch', 'piece-long-fold', 'piece-long-guide', 'piece-long-label', 'piece-short-cut'])
      expect(doc.getElementById(id)?.getAttribute('class'), id).toMatch(/^layer layer-/);
  });
});
