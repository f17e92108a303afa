import { LAYERS, type BoxMm, type Drawing, type DrawingItem, type DrawingPiece, type LayerName, type PathCommand, type PathItem, type TextItem, type TitleBlock } from './drawing.ts';
import { escapeXmlAttr, escapeXmlText } from './svg-serialize.ts';
import { layerStyle, svgNumber as n } from './svg-style.ts';

/**
 * A DOM the SVG used to be built in (the browser's own, jsdom/happy-dom, or svgdom in Node).
 * The markup is now written directly, so renderers need none; the parameter stays so callers
 * need not change. svg-via-dom.ts keeps the DOM renderer as the reference the tests compare with.
 */
export interface SvgDom {
  window: unknown;
  document: unknown;
}

/** Options for {@link renderSvg}. */
export interface SvgOptions {
  /** Space round the drawing, mm (default 5). */
  marginMm?: number;
  /** Draw the title block under the pieces (default true). */
  titleBlock?: boolean;
}

const GAP_MM = 8;
const TITLE_W_MM = 120;
const TITLE_ROW_MM = 5;

/** Path data with fixed 3-decimal numbers. */
export function pathData(cmds: readonly PathCommand[], dx = 0, dy = 0): string {
  let d = '';
  for (const c of cmds)
    d +=
      c.op === 'Z' ? 'Z'
      : c.op === 'C' ? `C${n(c.x1 + dx)} ${n(c.y1 + dy)} ${n(c.x2 + dx)} ${n(c.y2 + dy)} ${n(c.x + dx)} ${n(c.y + dy)}`
      : `${c.op}${n(c.x + dx)} ${n(c.y + dy)}`;
  return d;
}

/**
 * The markup being written. Elements are written as an XML serializer writes a tree
 * (svg-serialize.ts): attributes in the order set, values and text escaped the same way, an
 * element without children self-closed. Time was mostly the DOM and svg.js's attribute
 * parsing (CPU profile), so we write the bytes without building the tree.
 *
 * Attributes are appended one by one rather than passed as arrays of pairs: those arrays,
 * made for every item, and escaping every value were half of the writer's time (CPU profile
 * of the collar SVG: addItem, leaf, escapeXmlAttr and its regex 45 %). Values the writer makes
 * itself (numbers, path data, our own class names and styles) hold no character XML escapes,
 * so only values from the drawing's strings (piece ids, text, anchors) go through the escaper.
 */
class Markup {
  private out = '';
  /** Starts an element: `<name`; attributes follow, then {@link open} or {@link leaf}. */
  start(name: string): this {
    this.out += `<${name}`;
    return this;
  }
  /** An attribute whose value cannot hold `&<>"` or control characters (numbers, path data, constants). */
  attr(k: string, v: string): this {
    this.out += ` ${k}="${v}"`;
    return this;
  }
  /** An attribute whose value comes from the drawing's strings: escaped as the serializer does. */
  attrEscaped(k: string, v: string): this {
    this.out += ` ${k}="${escapeXmlAttr(v)}"`;
    return this;
  }
  /** Attributes already written out (` k="v"...`, escaped), e.g. a layer's style. */
  attrs(written: string): this {
    this.out += written;
    return this;
  }
  /** Ends the start tag; children follow, then {@link close}. */
  open(): void {
    this.out += '>';
  }
  close(name: string): void {
    this.out += `</${name}>`;
  }
  /** Ends an element with no children, or with one text node when `text` is not empty. */
  leaf(name: string, text = ''): void {
    // Setting textContent to '' leaves no text node in any DOM, so the element self-closes.
    this.out += text === '' ? '/>' : `>${escapeXmlText(text)}</${name}>`;
  }
  /** Markup written elsewhere. */
  raw(markup: string): void {
    this.out += markup;
  }
  toString(): string {
    return this.out;
  }
}

/** Attribute pairs as markup, escaped: written once per module, not once per element. */
const written = (pairs: readonly (readonly [string, string])[]): string => pairs.map(([k, v]) => ` ${k}="${escapeXmlAttr(v)}"`).join('');
const LAYER_ATTRS = Object.fromEntries(LAYERS.map((l) => [l, written(Object.entries(layerStyle(l)))])) as Record<LayerName, string>;
// The label layer fills text; its dimension lines and ticks need a stroke of their own.
const LABEL_LINE = written([
  ['fill', 'none'],
  ['stroke', '#000000'],
  ['stroke-width', '0.150'],
]);
const TITLE_STROKE = written([
  ['fill', 'none'],
  ['stroke', '#000000'],
  ['stroke-width', '0.300'],
]);

function addPath(m: Markup, it: PathItem): void {
  m.start('path').attr('d', pathData(it.commands));
  if (it.dashed) m.attr('class', 'dashed');
  if (it.layer === 'label') m.attrs(LABEL_LINE);
  m.leaf('path');
}

function addText(m: Markup, it: TextItem): void {
  m.start('text').attr('x', n(it.x)).attr('y', n(it.y)).attr('font-size', n(it.sizeMm));
  if (it.anchor !== 'start') m.attrEscaped('text-anchor', it.anchor);
  if (it.weight === 'bold') m.attr('font-weight', 'bold');
  if (it.rotateDeg) m.attr('transform', `rotate(${n(it.rotateDeg)} ${n(it.x)} ${n(it.y)})`);
  m.leaf('text', it.text);
}

function addItem(m: Markup, it: DrawingItem): void {
  if (it.type === 'path') addPath(m, it);
  else if (it.type === 'circle') m.start('circle').attr('cx', n(it.cx)).attr('cy', n(it.cy)).attr('r', n(it.r)).leaf('circle');
  else addText(m, it);
}

/** A piece's items by layer, in paint order, empty layers left out: one pass over the items. */
function byLayer(items: readonly DrawingItem[]): [LayerName, DrawingItem[]][] {
  const groups = new Map<LayerName, DrawingItem[]>(LAYERS.map((l) => [l, []]));
  for (const it of items) groups.get(it.layer)?.push(it);
  return [...groups].filter(([, its]) => its.length > 0);
}

function addPiece(m: Markup, piece: DrawingPiece, dx: number, dy: number): void {
  m.start('g').attrEscaped('id', `piece-${piece.id}`).attr('class', 'piece').attr('transform', `translate(${n(dx)} ${n(dy)})`);
  const layers = byLayer(piece.items);
  if (!layers.length) return m.leaf('g');
  m.open();
  for (const [layer, items] of layers) {
    m.start('g').attrEscaped('id', `piece-${piece.id}-${layer}`).attr('class', `layer layer-${layer}`).attrs(LAYER_ATTRS[layer]).open();
    for (const it of items) addItem(m, it);
    m.close('g');
  }
  m.close('g');
}

/** The title block's lines, first the pattern and revision, last the print-at-100 % note. */
export function titleRows(t: TitleBlock): string[] {
  return [
    `Latchet pattern: ${t.pattern}${t.revision ? `, revision ${t.revision}` : ''}`,
    t.size ? `Size: ${t.size}` : '',
    `Girth: ${t.girth} · Width: ${t.width} · Leather: ${t.leather}`,
    t.date ? `Date: ${t.date}` : '',
    ...(t.notes ?? []),
    'Print at 100 % (actual size). The bars below must measure 25 mm and 1 in.',
  ].filter(Boolean);
}

/** Width of the title block, mm. */
export function titleWidthMm(t: TitleBlock): number {
  return rowsWidthMm(titleRows(t));
}

function rowsWidthMm(rows: readonly string[]): number {
  // Estimated advance 0.6 x font size per character (Plex Sans averages a little less).
  return Math.max(TITLE_W_MM, ...rows.map((r) => [...r].length * 2.5 * 0.6 + 6));
}

/** A straight-edged path in the title block (its frame, a scale bar): stroke, then the data. */
function addTitlePath(m: Markup, d: string, scale: boolean): void {
  m.start('path');
  if (scale) m.attr('class', 'scale');
  m.attrs(TITLE_STROKE).attr('d', d).leaf('path');
}

function addTitle(m: Markup, rows: readonly string[], w: number, x: number, y: number): void {
  const h = (rows.length + 2) * TITLE_ROW_MM;
  m.start('g').attr('id', 'title-block').attr('class', 'layer layer-label').attrs(LAYER_ATTRS.label).open();
  addTitlePath(m, `M${n(x)} ${n(y)}L${n(x + w)} ${n(y)}L${n(x + w)} ${n(y + h)}L${n(x)} ${n(y + h)}Z`, false);
  rows.forEach((r, i) => addText(m, { type: 'text', layer: 'label', x: x + 2, y: y + (i + 1) * TITLE_ROW_MM, text: r, sizeMm: i === 0 ? 3 : 2.5, anchor: 'start', ...(i === 0 ? { weight: 'bold' as const } : {}) }));
  const by = y + (rows.length + 1) * TITLE_ROW_MM;
  addTitlePath(m, `M${n(x + 2)} ${n(by)}L${n(x + 27)} ${n(by)}M${n(x + 2)} ${n(by - 1.5)}L${n(x + 2)} ${n(by + 1.5)}M${n(x + 27)} ${n(by - 1.5)}L${n(x + 27)} ${n(by + 1.5)}`, true);
  addTitlePath(m, `M${n(x + 40)} ${n(by)}L${n(x + 65.4)} ${n(by)}M${n(x + 40)} ${n(by - 1.5)}L${n(x + 40)} ${n(by + 1.5)}M${n(x + 65.4)} ${n(by - 1.5)}L${n(x + 65.4)} ${n(by + 1.5)}`, true);
  addText(m, { type: 'text', layer: 'label', x: x + 29, y: by + 1, text: '25 mm', sizeMm: 2.5, anchor: 'start' });
  addText(m, { type: 'text', layer: 'label', x: x + 67.4, y: by + 1, text: '1 in', sizeMm: 2.5, anchor: 'start' });
  m.close('g');
}

function build(box: BoxMm, fill: (m: Markup) => void): string {
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const body = new Markup();
  fill(body);
  const inner = body.toString();
  const m = new Markup();
  m.start('svg')
    .attr('xmlns', 'http://www.w3.org/2000/svg')
    .attr('width', `${n(w)}mm`)
    .attr('height', `${n(h)}mm`)
    .attr('viewBox', `${n(box.minX)} ${n(box.minY)} ${n(w)} ${n(h)}`)
    .attr('version', '1.1');
  if (!inner) m.leaf('svg');
  else {
    m.open();
    m.raw(inner);
    m.close('svg');
  }
  return m.toString();
}

/**
 * Renders a Drawing as a full-size SVG: `width`/`height` in mm, viewBox in mm, numbers with
 * 3 decimals, labels XML-escaped, one `<g>` per piece and per layer. Pieces are stacked
 * top to bottom, the title block under them. The same Drawing gives the same bytes
 * everywhere; `_dom` is no longer used (see {@link SvgDom}).
 */
export function renderSvg(drawing: Drawing, _dom?: SvgDom, opts: SvgOptions = {}): string {
  const m = opts.marginMm ?? 5;
  const showTitle = opts.titleBlock ?? true;
  let y = 0;
  const placed = drawing.pieces.map((p) => {
    const at = { piece: p, dx: -p.bounds.minX, dy: y - p.bounds.minY };
    y += p.bounds.maxY - p.bounds.minY + GAP_MM;
    return at;
  });
  const rows = showTitle ? titleRows(drawing.title) : [];
  const titleW = showTitle ? rowsWidthMm(rows) : 0;
  const wide = Math.max(titleW, ...drawing.pieces.map((p) => p.bounds.maxX - p.bounds.minX));
  const titleH = showTitle ? (rows.length + 2) * TITLE_ROW_MM : -GAP_MM;
  const box: BoxMm = { minX: -m, minY: -m, maxX: wide + m, maxY: y + titleH + m };
  return build(box, (out) => {
    for (const p of placed) addPiece(out, p.piece, p.dx, p.dy);
    if (showTitle) addTitle(out, rows, titleW, 0, y);
  });
}

/**
 * One piece alone. `extent: 'blank'` sizes the SVG to the blank itself (viewBox 0, -w/2,
 * length, width), so its width and height are the blank's; labels outside it are clipped.
 */
export function renderPieceSvg(piece: DrawingPiece, _dom?: SvgDom, opts: { extent?: 'blank' | 'all' } = {}): string {
  const box: BoxMm = opts.extent === 'blank' ? { minX: 0, minY: -piece.widthMm / 2, maxX: piece.lengthMm, maxY: piece.widthMm / 2 } : piece.bounds;
  return build(box, (m) => addPiece(m, piece, 0, 0));
}
