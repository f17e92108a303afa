// The reference renderer: the SVG built as an element tree with svg.js over a DOM (the
// browser's, happy-dom, jsdom or svgdom) and written out by serializeXml. Production uses the
// direct writer in svg.ts, which writes the same bytes about ten times faster (no DOM, no
// attribute parsing); svg.test.ts checks the two agree on every preset and on random specs.
import { SVG, registerWindow, type Container, type Svg } from '@svgdotjs/svg.js';
import { LAYERS, type BoxMm, type Drawing, type DrawingItem, type DrawingPiece, type TitleBlock } from './drawing.ts';
import { serializeXml } from './svg-serialize.ts';
import { layerStyle, svgNumber as n } from './svg-style.ts';
import { pathData, titleRows, titleWidthMm, type SvgDom, type SvgOptions } from './svg.ts';

const GAP_MM = 8;
const TITLE_ROW_MM = 5;

function addItem(g: Container, it: DrawingItem): void {
  if (it.type === 'path') {
    const el = g.element('path').attr({ d: pathData(it.commands) });
    if (it.dashed) el.attr({ class: 'dashed' });
    // The label layer fills text; its dimension lines and ticks need a stroke of their own.
    if (it.layer === 'label') el.attr({ fill: 'none', stroke: '#000000', 'stroke-width': '0.150' });
  } else if (it.type === 'circle') {
    g.element('circle').attr({ cx: n(it.cx), cy: n(it.cy), r: n(it.r) });
  } else {
    const el = g.element('text').attr({ x: n(it.x), y: n(it.y), 'font-size': n(it.sizeMm) });
    if (it.anchor !== 'start') el.attr({ 'text-anchor': it.anchor });
    if (it.weight === 'bold') el.attr({ 'font-weight': 'bold' });
    if (it.rotateDeg) el.attr({ transform: `rotate(${n(it.rotateDeg)} ${n(it.x)} ${n(it.y)})` });
    (el.node as unknown as { textContent: string }).textContent = it.text;
  }
}

function addPiece(root: Svg, piece: DrawingPiece, dx: number, dy: number): void {
  const pg = root.group().attr({ id: `piece-${piece.id}`, class: 'piece', transform: `translate(${n(dx)} ${n(dy)})` });
  for (const layer of LAYERS) {
    const items = piece.items.filter((i) => i.layer === layer);
    if (!items.length) continue;
    const g = pg.group().attr({ id: `piece-${piece.id}-${layer}`, class: `layer layer-${layer}`, ...layerStyle(layer) });
    for (const it of items) addItem(g, it);
  }
}

function addTitle(root: Svg, t: TitleBlock, x: number, y: number): number {
  const rows = titleRows(t);
  const w = titleWidthMm(t);
  const h = (rows.length + 2) * TITLE_ROW_MM;
  const g = root.group().attr({ id: 'title-block', class: 'layer layer-label', ...layerStyle('label') });
  g.element('path').attr({ fill: 'none', stroke: '#000000', 'stroke-width': '0.300', d: `M${n(x)} ${n(y)}L${n(x + w)} ${n(y)}L${n(x + w)} ${n(y + h)}L${n(x)} ${n(y + h)}Z` });
  rows.forEach((r, i) => addItem(g, { type: 'text', layer: 'label', x: x + 2, y: y + (i + 1) * TITLE_ROW_MM, text: r, sizeMm: i === 0 ? 3 : 2.5, anchor: 'start', ...(i === 0 ? { weight: 'bold' as const } : {}) }));
  const by = y + (rows.length + 1) * TITLE_ROW_MM;
  g.element('path').attr({ class: 'scale', fill: 'none', stroke: '#000000', 'stroke-width': '0.300', d: `M${n(x + 2)} ${n(by)}L${n(x + 27)} ${n(by)}M${n(x + 2)} ${n(by - 1.5)}L${n(x + 2)} ${n(by + 1.5)}M${n(x + 27)} ${n(by - 1.5)}L${n(x + 27)} ${n(by + 1.5)}` });
  g.element('path').attr({ class: 'scale', fill: 'none', stroke: '#000000', 'stroke-width': '0.300', d: `M${n(x + 40)} ${n(by)}L${n(x + 65.4)} ${n(by)}M${n(x + 40)} ${n(by - 1.5)}L${n(x + 40)} ${n(by + 1.5)}M${n(x + 65.4)} ${n(by - 1.5)}L${n(x + 65.4)} ${n(by + 1.5)}` });
  addItem(g, { type: 'text', layer: 'label', x: x + 29, y: by + 1, text: '25 mm', sizeMm: 2.5, anchor: 'start' });
  addItem(g, { type: 'text', layer: 'label', x: x + 67.4, y: by + 1, text: '1 in', sizeMm: 2.5, anchor: 'start' });
  return h;
}

function build(dom: SvgDom, box: BoxMm, fill: (root: Svg) => void): string {
  // svg.js keeps one global window; point it at the DOM we were given, every call.
  registerWindow(dom.window as Window, dom.document as Document);
  const root = SVG();
  fill(root);
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  return serializeXml(root.node as unknown as Parameters<typeof serializeXml>[0], [
    ['xmlns', 'http://www.w3.org/2000/svg'],
    ['width', `${n(w)}mm`],
    ['height', `${n(h)}mm`],
    ['viewBox', `${n(box.minX)} ${n(box.minY)} ${n(w)} ${n(h)}`],
  ]);
}

/**
 * Renders a Drawing as a full-size SVG: `width`/`height` in mm, viewBox in mm, numbers with
 * 3 decimals, labels XML-escaped, one `<g>` per piece and per layer. Pieces are stacked
 * top to bottom, the title block under them. The same Drawing gives the same bytes over any DOM.
 */
export function renderSvgViaDom(drawing: Drawing, dom: SvgDom, opts: SvgOptions = {}): string {
  const m = opts.marginMm ?? 5;
  const showTitle = opts.titleBlock ?? true;
  let y = 0;
  const placed = drawing.pieces.map((p) => {
    const at = { piece: p, dx: -p.bounds.minX, dy: y - p.bounds.minY };
    y += p.bounds.maxY - p.bounds.minY + GAP_MM;
    return at;
  });
  const wide = Math.max(showTitle ? titleWidthMm(drawing.title) : 0, ...drawing.pieces.map((p) => p.bounds.maxX - p.bounds.minX));
  const titleH = showTitle ? (titleRows(drawing.title).length + 2) * TITLE_ROW_MM : -GAP_MM;
  const box: BoxMm = { minX: -m, minY: -m, maxX: wide + m, maxY: y + titleH + m };
  return build(dom, box, (root) => {
    for (const p of placed) addPiece(root, p.piece, p.dx, p.dy);
    if (showTitle) addTitle(root, drawing.title, 0, y);
  });
}

/**
 * One piece alone. `extent: 'blank'` sizes the SVG to the blank itself (viewBox 0, -w/2,
 * length, width), so its width and height are the blank's; labels outside it are clipped.
 */
export function renderPieceSvgViaDom(piece: DrawingPiece, dom: SvgDom, opts: { extent?: 'blank' | 'all' } = {}): string {
  const box: BoxMm = opts.extent === 'blank' ? { minX: 0, minY: -piece.widthMm / 2, maxX: piece.lengthMm, maxY: piece.widthMm / 2 } : piece.bounds;
  return build(dom, box, (root) => addPiece(root, piece, 0, 0));
}
