import { LAYERS, type BoxMm, type Drawing, type DrawingItem, type DrawingPiece, type PathCommand, type TitleBlock } from './drawing.ts';
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
 */
class Markup {
  private out = '';
  open(name: string, attrs: readonly (readonly [string, string])[]): void {
    this.out += `<${name}`;
    for (const [k, v] of attrs) this.out += ` ${k}="${escapeXmlAttr(v)}"`;
    this.out += '>';
  }
  close(name: string): void {
    this.out += `</${name}>`;
  }
  /** An element with no children, or with one text node when `text` is not empty. */
  leaf(name: string, attrs: readonly (readonly [string, string])[], text = ''): void {
    this.out += `<${name}`;
    for (const [k, v] of attrs) this.out += ` ${k}="${escapeXmlAttr(v)}"`;
    // Setting textContent to '' leaves no text node in any DOM, so the element self-closes.
    this.out += text === '' ? '/>' : `>${escapeXmlText(text)}</${name}>`;
  }
  toString(): string {
    return this.out;
  }
}

const LAYER_ATTRS = Object.fromEntries(LAYERS.map((l) => [l, Object.entries(layerStyle(l))])) as Record<(typeof LAYERS)[number], [string, string][]>;
const LABEL_LINE: [string, string][] = [
  ['fill', 'none'],
  ['stroke', '#000000'],
  ['stroke-width', '0.150'],
];

function addItem(m: Markup, it: DrawingItem): void {
  if (it.type === 'path') {
    const attrs: [string, string][] = [['d', pathData(it.commands)]];
    if (it.dashed) attrs.push(['class', 'dashed']);
    // The label layer fills text; its dimension lines and ticks need a stroke of their own.
    if (it.layer === 'label') attrs.push(...LABEL_LINE);
    m.leaf('path', attrs);
  } else if (it.type === 'circle') {
    m.leaf('circle', [
      ['cx', n(it.cx)],
      ['cy', n(it.cy)],
      ['r', n(it.r)],
    ]);
  } else {
    const attrs: [string, string][] = [
      ['x', n(it.x)],
      ['y', n(it.y)],
      ['font-size', n(it.sizeMm)],
    ];
    if (it.anchor !== 'start') attrs.push(['text-anchor', it.anchor]);
    if (it.weight === 'bold') attrs.push(['font-weight', 'bold']);
    if (it.rotateDeg) attrs.push(['transform', `rotate(${n(it.rotateDeg)} ${n(it.x)} ${n(it.y)})`]);
    m.leaf('text', attrs, it.text);
  }
}

function addPiece(m: Markup, piece: DrawingPiece, dx: number, dy: number): void {
  const attrs: [string, string][] = [
    ['id', `piece-${piece.id}`],
    ['class', 'piece'],
    ['transform', `translate(${n(dx)} ${n(dy)})`],
  ];
  const layers = LAYERS.map((layer) => ({ layer, items: piece.items.filter((i) => i.layer === layer) })).filter((l) => l.items.length > 0);
  if (!layers.length) return m.leaf('g', attrs);
  m.open('g', attrs);
  for (const { layer, items } of layers) {
    m.open('g', [['id', `piece-${piece.id}-${layer}`], ['class', `layer layer-${layer}`], ...LAYER_ATTRS[layer]]);
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
  // Estimated advance 0.6 x font size per character (Plex Sans averages a little less).
  return Math.max(TITLE_W_MM, ...titleRows(t).map((r) => [...r].length * 2.5 * 0.6 + 6));
}

function addTitle(m: Markup, t: TitleBlock, x: number, y: number): void {
  const rows = titleRows(t);
  const w = titleWidthMm(t);
  const h = (rows.length + 2) * TITLE_ROW_MM;
  const stroke: [string, string][] = [
    ['fill', 'none'],
    ['stroke', '#000000'],
    ['stroke-width', '0.300'],
  ];
  m.open('g', [['id', 'title-block'], ['class', 'layer layer-label'], ...LAYER_ATTRS.label]);
  m.leaf('path', [...stroke, ['d', `M${n(x)} ${n(y)}L${n(x + w)} ${n(y)}L${n(x + w)} ${n(y + h)}L${n(x)} ${n(y + h)}Z`]]);
  rows.forEach((r, i) => addItem(m, { type: 'text', layer: 'label', x: x + 2, y: y + (i + 1) * TITLE_ROW_MM, text: r, sizeMm: i === 0 ? 3 : 2.5, anchor: 'start', ...(i === 0 ? { weight: 'bold' as const } : {}) }));
  const by = y + (rows.length + 1) * TITLE_ROW_MM;
  m.leaf('path', [['class', 'scale'], ...stroke, ['d', `M${n(x + 2)} ${n(by)}L${n(x + 27)} ${n(by)}M${n(x + 2)} ${n(by - 1.5)}L${n(x + 2)} ${n(by + 1.5)}M${n(x + 27)} ${n(by - 1.5)}L${n(x + 27)} ${n(by + 1.5)}`]]);
  m.leaf('path', [['class', 'scale'], ...stroke, ['d', `M${n(x + 40)} ${n(by)}L${n(x + 65.4)} ${n(by)}M${n(x + 40)} ${n(by - 1.5)}L${n(x + 40)} ${n(by + 1.5)}M${n(x + 65.4)} ${n(by - 1.5)}L${n(x + 65.4)} ${n(by + 1.5)}`]]);
  addItem(m, { type: 'text', layer: 'label', x: x + 29, y: by + 1, text: '25 mm', sizeMm: 2.5, anchor: 'start' });
  addItem(m, { type: 'text', layer: 'label', x: x + 67.4, y: by + 1, text: '1 in', sizeMm: 2.5, anchor: 'start' });
  m.close('g');
}

function build(box: BoxMm, fill: (m: Markup) => void): string {
  const w = box.maxX - box.minX;
  const h = box.maxY - box.minY;
  const root: [string, string][] = [
    ['xmlns', 'http://www.w3.org/2000/svg'],
    ['width', `${n(w)}mm`],
    ['height', `${n(h)}mm`],
    ['viewBox', `${n(box.minX)} ${n(box.minY)} ${n(w)} ${n(h)}`],
    ['version', '1.1'],
  ];
  const body = new Markup();
  fill(body);
  const inner = body.toString();
  const m = new Markup();
  if (!inner) m.leaf('svg', root);
  else m.open('svg', root);
  return inner ? `${m.toString()}${inner}</svg>` : m.toString();
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
  const wide = Math.max(showTitle ? titleWidthMm(drawing.title) : 0, ...drawing.pieces.map((p) => p.bounds.maxX - p.bounds.minX));
  const titleH = showTitle ? (titleRows(drawing.title).length + 2) * TITLE_ROW_MM : -GAP_MM;
  const box: BoxMm = { minX: -m, minY: -m, maxX: wide + m, maxY: y + titleH + m };
  return build(box, (out) => {
    for (const p of placed) addPiece(out, p.piece, p.dx, p.dy);
    if (showTitle) addTitle(out, drawing.title, 0, y);
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
