/**
 * The label a person reads for every field of a strap spec, and the kind of value it holds,
 * so messages name "Girth" or "Tip hole spacing" in the form's unit and never a schema path
 * (`girthMm`, `pieces.0.end.holes.count`). Forms, routes, compare and the CLI read these.
 */

/** What a field holds; decides how its limits are written. */
export type FieldValueKind = 'length' | 'count' | 'thickness' | 'percent' | 'ratio' | 'text' | 'choice' | 'yes-no' | 'list';

/** A field's label and value kind. */
export interface FieldLabel {
  label: string;
  kind: FieldValueKind;
}

const f = (label: string, kind: FieldValueKind): FieldLabel => ({ label, kind });

/** Fields at the top of the spec (and hardware, rule), by dotted path. */
const TOP: Record<string, FieldLabel> = {
  '': f('Pattern', 'text'),
  specVersion: f('Pattern format version', 'choice'),
  kind: f('Kind of strap', 'choice'),
  name: f('Pattern name', 'text'),
  units: f('Show lengths in', 'choice'),
  mode: f('Length from', 'choice'),
  girthMm: f('Girth', 'length'),
  girthMeasured: f('Girth measured', 'choice'),
  easeMm: f('Ease', 'length'),
  closes: f('Fastens round the body', 'yes-no'),
  widthMm: f('Strap width', 'length'),
  thickness: f('Thickness', 'thickness'),
  'thickness.unit': f('Thickness in', 'choice'),
  'thickness.value': f('Thickness', 'thickness'),
  edgeGuideMm: f('Edge guide', 'length'),
  rule: f('The shop rule', 'choice'),
  'rule.measure': f('The shop rule', 'choice'),
  'rule.allowanceMm': f('Rule allowance', 'length'),
  'rule.blankMm': f('Rule blank length', 'length'),
  hardware: f('Hardware', 'text'),
  'hardware.buckle': f('Buckle', 'text'),
  'hardware.buckle.style': f('Buckle', 'choice'),
  'hardware.buckle.insideWidthMm': f('Buckle inside width', 'length'),
  'hardware.buckle.tongueLengthMm': f('Tongue length', 'length'),
  'hardware.buckle.tongueWireMm': f('Tongue wire', 'length'),
  'hardware.dRings': f('D-rings', 'text'),
  'hardware.dRings.count': f('D-rings', 'count'),
  'hardware.dRings.insideWidthMm': f('D-ring inside width', 'length'),
  'hardware.dRings.wireDiameterMm': f('D-ring wire', 'length'),
  'hardware.keepers': f('Keepers', 'count'),
  'hardware.clips': f('Clips', 'text'),
  'hardware.clips.kind': f('Clip', 'choice'),
  'hardware.clips.count': f('Clips', 'count'),
  'hardware.clips.insideWidthMm': f('Clip eye inside width', 'length'),
  'hardware.loopExtraMm': f('Hardware length in the loop', 'length'),
  foldK: f('Fold K factor', 'ratio'),
  maxStripMm: f('Usual strip length', 'length'),
  pieces: f('Pieces', 'list'),
  sizes: f('Sizes', 'list'),
};

/** Fields of one size of the run, after "sizes.N.". */
const SIZE: Record<string, FieldLabel> = {
  '': f('', 'text'),
  name: f('name', 'text'),
  girthMm: f('girth', 'length'),
  widthMm: f('width', 'length'),
  holes: f('holes', 'text'),
  'holes.count': f('holes', 'count'),
  'holes.spacingMm': f('hole spacing', 'length'),
  hardware: f('hardware', 'text'),
  'hardware.buckleInsideWidthMm': f('buckle inside width', 'length'),
  'hardware.dRingInsideWidthMm': f('D-ring inside width', 'length'),
};

/** Fields of one piece, after "pieces.N." (ends and lists are handled below). */
const PIECE: Record<string, FieldLabel> = {
  '': f('', 'text'),
  id: f('short name', 'text'),
  name: f('piece name', 'text'),
  role: f('part it plays', 'choice'),
  count: f('number to cut', 'count'),
  length: f('length', 'choice'),
  'length.kind': f('length from', 'choice'),
  'length.blankMm': f('blank length', 'length'),
  'length.layers': f('layers of strap inside the keeper', 'count'),
  'length.easeMm': f('keeper ease', 'length'),
  'length.overlapMm': f('keeper overlap', 'length'),
  widthMm: f('width', 'length'),
  taper: f('width changes', 'list'),
  stitchRows: f('stitch rows', 'list'),
};

/** Fields of one end, after "start." or "end.". */
const END: Record<string, FieldLabel> = {
  '': f('', 'choice'),
  kind: f('construction', 'choice'),
  foldAtMm: f('fold from the end', 'length'),
  barDiameterMm: f('bar diameter', 'length'),
  slot: f('tongue slot', 'text'),
  'slot.lengthMm': f('tongue slot length', 'length'),
  'slot.widthMm': f('tongue slot width', 'length'),
  flapHoles: f('flap holes', 'list'),
  bodyHoles: f('single-layer holes', 'list'),
  holes: f('holes', 'list'),
  'holes.count': f('number of holes', 'count'),
  'holes.spacingMm': f('hole spacing', 'length'),
  'holes.diameterMm': f('hole diameter', 'length'),
  'holes.firstFromTipMm': f('last hole to tip', 'length'),
  'holes.middleHole': f('middle hole', 'count'),
  'holes.nominalIndex': f('middle hole', 'count'),
  loopInnerMm: f('loop inside length', 'length'),
  overlapMm: f('loop overlap', 'length'),
  shape: f('shape', 'choice'),
  'shape.kind': f('shape', 'choice'),
  'shape.radiusMm': f('corner radius', 'length'),
  'shape.chamferMm': f('corner clip', 'length'),
  'shape.depthMm': f('point length', 'length'),
};

/** Fields of one hole in a list, after "flapHoles.N." etc. */
const HOLE: Record<string, FieldLabel> = {
  '': f('', 'text'),
  fromEndMm: f('distance from the end', 'length'),
  yMm: f('distance off the centre line', 'length'),
  diameterMm: f('diameter', 'length'),
  fastener: f('fastener', 'choice'),
};

const TAPER: Record<string, FieldLabel> = {
  '': f('', 'text'),
  atMm: f('position', 'length'),
  from: f('measured from', 'choice'),
  widthMm: f('width', 'length'),
};

const STITCH: Record<string, FieldLabel> = {
  '': f('', 'text'),
  path: f('runs along', 'choice'),
  fromMm: f('start', 'length'),
  fromRef: f('start measured from', 'choice'),
  toMm: f('finish', 'length'),
  toRef: f('finish measured from', 'choice'),
  offsetMm: f('distance in from the edge', 'length'),
  pitchMm: f('stitch spacing', 'length'),
  tolerancePct: f('spacing tolerance', 'percent'),
};

type Seg = string | number;
const isIndex = (s: Seg) => typeof s === 'number' || /^\d+$/.test(s);
const join = (...parts: string[]) => parts.filter(Boolean).join(' ');
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const rest = (path: readonly Seg[], from: number) => path.slice(from).map(String).join('.');

interface PieceLike {
  name?: unknown;
  role?: unknown;
}

/** "Buckle end"/"Tip" on the strap; "first end"/"second end" on other pieces. */
function endWord(which: Seg, strap: boolean): string {
  if (strap) return which === 'start' ? 'buckle end' : 'tip';
  return which === 'start' ? 'first end' : 'second end';
}

/** Label of a field under one end of a piece (path after "start"/"end"). */
function endLabel(end: string, path: readonly Seg[]): FieldLabel {
  const [list, idx] = path;
  if ((list === 'flapHoles' || list === 'bodyHoles' || list === 'holes') && idx !== undefined && isIndex(idx)) {
    const leaf = HOLE[rest(path, 2)] ?? HOLE['']!;
    const what = list === 'flapHoles' ? 'flap hole' : list === 'bodyHoles' ? 'single-layer hole' : 'hole';
    return f(join(end, what, String(Number(idx) + 1), leaf.label), leaf.kind);
  }
  const leaf = END[rest(path, 0)] ?? END['']!;
  return f(join(end, leaf.label), leaf.kind);
}

/**
 * The label and value kind of a spec field from its path (`['pieces', 0, 'end', 'holes',
 * 'count']` or "pieces.0.end.holes.count"). With the spec (or a form's values) the piece's own
 * name is used; the strap piece needs no name. Unknown paths get the nearest known label.
 */
export function specFieldLabel(path: readonly Seg[] | string, spec?: unknown): FieldLabel {
  const p: Seg[] = typeof path === 'string' ? (path === '' ? [] : path.split('.')) : [...path];
  const top = p[0];
  if (top === 'sizes' && p[1] !== undefined && isIndex(p[1])) {
    const leaf = SIZE[rest(p, 2)] ?? SIZE['']!;
    return f(join(`Size ${Number(p[1]) + 1}`, leaf.label), leaf.kind);
  }
  if (top === 'pieces' && p[1] !== undefined && isIndex(p[1])) {
    const i = Number(p[1]);
    const piece = ((spec as { pieces?: PieceLike[] } | undefined)?.pieces ?? [])[i];
    const strap = piece ? piece.role === 'strap' : i === 0;
    const name = strap ? '' : typeof piece?.name === 'string' && piece.name.trim() ? piece.name.trim() : `Piece ${i + 1}`;
    const inner = innerPieceLabel(p.slice(2), strap);
    const text = name ? (inner.label ? `${name}: ${inner.label}` : name) : cap(inner.label || 'strap');
    return f(text, inner.kind);
  }
  for (let n = p.length; n >= 0; n--) {
    const hit = TOP[rest(p.slice(0, n), 0)];
    if (hit) return hit;
  }
  return TOP['']!;
}

/** Label inside one piece, without the piece's name. */
function innerPieceLabel(p: readonly Seg[], strap: boolean): FieldLabel {
  const [head, idx] = p;
  if (head === 'start' || head === 'end') return endLabel(endWord(head, strap), p.slice(1));
  if (head === 'taper' && idx !== undefined && isIndex(idx)) {
    const leaf = TAPER[rest(p, 2)] ?? TAPER['']!;
    return f(join('width change', String(Number(idx) + 1), leaf.label), leaf.kind);
  }
  if (head === 'stitchRows' && idx !== undefined && isIndex(idx)) {
    const leaf = STITCH[rest(p, 2)] ?? STITCH['']!;
    return f(join('stitch row', String(Number(idx) + 1), leaf.label), leaf.kind);
  }
  if (head === 'widthMm' && strap) return f('strap width at this piece', 'length');
  return PIECE[rest(p, 0)] ?? PIECE['']!;
}

/** Just the label text, capitalised, for headings and compare rows. */
export function specLabel(path: readonly Seg[] | string, spec?: unknown): string {
  return cap(specFieldLabel(path, spec).label);
}
