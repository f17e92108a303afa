import type { Drawing, DrawingItem, DrawingPiece, PathCommand } from '../render/drawing.ts';
import type { StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength } from '../units/format-length.ts';
import { label, labelLine, NAME_SIZE_MM, LABEL_SIZE_MM, textLengthMm } from './draw-labels.ts';
import type { Feature, PatternLayout, PieceLayout } from './layout-types.ts';
import { insetChain } from './offset.ts';
import { pieceOutline } from './outline.ts';
import { primsToCommands, type Prim } from './prims.ts';
import { titleBlock } from './title-block.ts';
import { widthProfile } from './width-profile.ts';

/** Options for {@link drawLayout}. */
export interface DrawOptions {
  /** Draw size and distance labels (default true). */
  labels?: boolean;
  /** Revision and date strings for the title block. */
  revision?: string;
  date?: string;
}

/** Half-length (mm) of the centre cross drawn on every hole. */
const CROSS_MM = 1.5;
/** Radius (mm) drawn for a stitch hole (a pricking iron's mark). */
const STITCH_R_MM = 0.4;

function slotCommands(f: Feature): PathCommand[] {
  const w = f.widthMm ?? 1;
  const r = w / 2;
  const half = Math.max(0, (f.lengthMm ?? w) / 2 - r);
  const x = f.atMm, y = f.yMm;
  const prims: Prim[] = [
    { type: 'line', a: { x: x - half, y: y - r }, b: { x: x + half, y: y - r } },
    { type: 'arc', c: { x: x + half, y }, r, a0: -Math.PI / 2, a1: Math.PI / 2 },
    { type: 'line', a: { x: x + half, y: y + r }, b: { x: x - half, y: y + r } },
    { type: 'arc', c: { x: x - half, y }, r, a0: Math.PI / 2, a1: (3 * Math.PI) / 2 },
  ];
  return primsToCommands(prims, true);
}

function cross(x: number, y: number): DrawingItem {
  return {
    type: 'path',
    layer: 'punch',
    commands: [
      { op: 'M', x: x - CROSS_MM, y },
      { op: 'L', x: x + CROSS_MM, y },
      { op: 'M', x, y: y - CROSS_MM },
      { op: 'L', x, y: y + CROSS_MM },
    ],
  };
}

function sizeLabel(f: Feature, u: 'in' | 'mm', piece: PieceLayout): string {
  if (f.kind === 'slot') return `slot ${formatLength(f.lengthMm ?? 0, u)} x ${formatLength(f.widthMm ?? 0, u)}`;
  if (f.kind === 'fold') return 'FOLD';
  const layers = f.layers && f.layers > 1 ? `, ${f.layers} layers` : f.partnerAtMm === undefined && f.kind !== 'adjust-hole' ? ', 1 layer' : '';
  // Adjustment holes say what they fit, so the template itself answers "which hole for whom".
  const fit = f.kind === 'adjust-hole' ? piece.fit?.holes.find((h) => Math.abs(h.atMm - f.atMm) < 1e-6) : undefined;
  const fits = fit ? `, fits ${formatLength(fit.innerMm, u)}` : '';
  return `Ø${formatLength(f.diameterMm ?? 0, u)} ${f.punch?.size ?? ''} ${f.label.split(',')[0]}${layers}${fits}`.replace(/\s+/g, ' ').trim();
}

/** Draws one piece: cut outline, slots, holes with crosses, stitch marks, folds, edge guide, labels. */
function drawPiece(spec: StrapSpec, piece: PieceLayout, withLabels: boolean): DrawingPiece {
  const u = spec.units;
  const ps = spec.pieces.find((p) => p.id === piece.id)!;
  const profile = widthProfile(ps, spec.widthMm, piece.blankLengthMm);
  const outline = pieceOutline(profile, ps.start.shape, ps.end.shape);
  const items: DrawingItem[] = [];
  const W = piece.widthMm;
  const L = piece.blankLengthMm;
  if (spec.edgeGuideMm > 0) items.push({ type: 'path', layer: 'guide', dashed: true, commands: primsToCommands(insetChain(outline, spec.edgeGuideMm), true) });
  for (const fd of piece.folds) {
    const h = profile.at(fd.atMm) / 2;
    items.push({ type: 'path', layer: 'fold', dashed: true, commands: [{ op: 'M', x: fd.atMm, y: -h }, { op: 'L', x: fd.atMm, y: h }] });
  }
  items.push({ type: 'path', layer: 'cut', commands: primsToCommands(outline, true) });
  for (const f of piece.features) {
    if (f.kind === 'slot') items.push({ type: 'path', layer: 'cut', commands: slotCommands(f) });
    else if (f.diameterMm !== undefined) items.push({ type: 'circle', layer: 'punch', cx: f.atMm, cy: f.yMm, r: f.diameterMm / 2 });
    if (f.kind !== 'fold') items.push(cross(f.atMm, f.yMm));
  }
  for (const row of piece.stitchRows) for (const h of row.holes) items.push({ type: 'circle', layer: 'punch', cx: h.x, cy: h.y, r: STITCH_R_MM });
  let minY = -W / 2, maxY = W / 2;
  if (withLabels) {
    const above = -W / 2 - 2;
    const below = W / 2 + 4;
    let belowLen = 0;
    items.push(labelLine(0, below, L, below));
    const datum = ps.start.kind === 'fold-over' && ps.start.slot ? 'datum 0 (buckle end)' : 'datum 0';
    items.push(label(0, above, datum, { rotateDeg: -90 }));
    let aboveLen = textLengthMm(datum, LABEL_SIZE_MM);
    // Features sharing a station (the fold and its tongue slot) share one label and one dimension.
    const stations: { atMm: number; texts: string[] }[] = [];
    for (const f of piece.features) {
      const last = stations[stations.length - 1];
      if (last && Math.abs(last.atMm - f.atMm) < 0.05) last.texts.push(sizeLabel(f, u, piece));
      else stations.push({ atMm: f.atMm, texts: [sizeLabel(f, u, piece)] });
    }
    for (const st of stations) {
      const s = [...new Set(st.texts)].join(' + ');
      const d = formatLength(st.atMm, u);
      items.push(label(st.atMm + LABEL_SIZE_MM / 2, above, s, { rotateDeg: -90 }));
      items.push(labelLine(st.atMm, below - 1.5, st.atMm, below + 1.5));
      items.push(label(st.atMm + LABEL_SIZE_MM / 2, below + 2.5, d, { rotateDeg: -90, anchor: 'end' }));
      aboveLen = Math.max(aboveLen, textLengthMm(s, LABEL_SIZE_MM));
      belowLen = Math.max(belowLen, textLengthMm(d, LABEL_SIZE_MM));
    }
    items.push(labelLine(L, below - 1.5, L, below + 1.5));
    const lenText = `${formatLength(L, u)} blank`;
    items.push(label(L + LABEL_SIZE_MM / 2, below + 2.5, lenText, { rotateDeg: -90, anchor: 'end' }));
    belowLen = Math.max(belowLen, textLengthMm(lenText, LABEL_SIZE_MM));
    const nameY = below + 2.5 + belowLen + NAME_SIZE_MM + 2;
    const name = `${piece.name}${piece.count > 1 ? ` x ${piece.count}` : ''}: ${formatLength(L, u)} x ${formatLength(W, u)}`;
    items.push(label(0, nameY, name, { sizeMm: NAME_SIZE_MM, weight: 'bold' }));
    let lastY = nameY;
    if (piece.stitchRows.length) {
      const holes = piece.stitchRows.reduce((a, r) => a + r.holes.length, 0);
      const thread = piece.stitchRows.reduce((a, r) => a + r.threadMm, 0);
      const pitches = [...new Set(piece.stitchRows.map((r) => `${String(r.pitchMm)} mm iron at ${r.adjustedPitchMm.toFixed(2)} mm`))].join(', ');
      lastY += LABEL_SIZE_MM + 2;
      items.push(label(0, lastY, `Stitching: ${piece.stitchRows.length} rows, ${holes} holes, ${pitches}; thread about ${formatLength(thread, u)} (4 x seam, common practice)`));
    }
    minY = above - aboveLen;
    maxY = lastY + 1;
  }
  return {
    id: piece.id,
    name: piece.name,
    lengthMm: L,
    widthMm: W,
    bounds: { minX: -CROSS_MM, minY: Math.min(minY, -W / 2), maxX: L + LABEL_SIZE_MM * 2, maxY },
    items,
  };
}

/**
 * The Drawing of a layout: one piece per blank (x from the datum, y across with the
 * centreline at 0, all mm), layered cut / punch / fold / guide / label, and a title block.
 */
export function drawLayout(layout: PatternLayout, spec: StrapSpec, opts: DrawOptions = {}): Drawing {
  const withLabels = opts.labels ?? true;
  return { title: titleBlock(layout, spec, opts), pieces: layout.pieces.map((p) => drawPiece(spec, p, withLabels)) };
}
