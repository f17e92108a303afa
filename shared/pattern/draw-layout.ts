import type { Drawing, DrawingItem, DrawingPiece, PathCommand } from '../render/drawing.ts';
import type { StrapSpec } from '../schemas/strap-spec.ts';
import { itemsBounds } from './draw-labels.ts';
import { pieceLabels } from './feature-labels.ts';
import { hardwareCaptions, hardwareNotes } from './hardware-labels.ts';
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
  // Hardware that rides on the piece: a guide-layer mark where each ring's bar lies across the strap.
  const rings = piece.hardware ?? [];
  for (const r of rings) {
    const h = Math.min(profile.at(r.atMm), r.insideWidthMm) / 2;
    items.push({ type: 'path', layer: 'guide', dashed: true, commands: [{ op: 'M', x: r.atMm, y: -h }, { op: 'L', x: r.atMm, y: h }] });
  }
  if (withLabels) {
    const first = rings[0];
    const extra = first
      ? {
          above: hardwareNotes(rings),
          caption: hardwareCaptions(rings, u),
        }
      : {};
    items.push(...pieceLabels(piece, ps, u, extra).items);
  }
  const b = itemsBounds(items);
  return {
    id: piece.id,
    name: piece.name,
    lengthMm: L,
    widthMm: W,
    // Everything drawn, labels included (estimated with a conservative glyph advance), and never less than the blank.
    bounds: { minX: Math.min(b.minX, 0), minY: Math.min(b.minY, -W / 2), maxX: Math.max(b.maxX, L), maxY: Math.max(b.maxY, W / 2) },
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
