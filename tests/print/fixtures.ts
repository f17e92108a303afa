// Hand-made Drawings for the print tests, independent of the engine: a collar-like strip,
// a belt-like strip, a watch strap's two pieces. Lengths are the check values of the print
// issue (21 in collar, 48 in belt; watch pieces about 120/75 mm, common practice).
import type { Drawing, DrawingItem, DrawingPiece, PathCommand } from '@shared/render/drawing.ts';

const K = 0.5522847498307936;

/** A strip with a round tip: square buckle end at x = 0, semicircle tip ending at x = length. */
function outline(lengthMm: number, widthMm: number): PathCommand[] {
  const r = widthMm / 2;
  const a = lengthMm - r;
  return [
    { op: 'M', x: 0, y: -r },
    { op: 'L', x: a, y: -r },
    { op: 'C', x1: a + r * K, y1: -r, x2: lengthMm, y2: -r * K, x: lengthMm, y: 0 },
    { op: 'C', x1: lengthMm, y1: r * K, x2: a + r * K, y2: r, x: a, y: r },
    { op: 'L', x: 0, y: r },
    { op: 'Z' },
  ];
}

/** A strip piece with a fold, a tongue slot, holes and datum labels. */
export function stripPiece(id: string, name: string, lengthMm: number, widthMm: number, holesAtMm: number[], foldAtMm?: number): DrawingPiece {
  const r = widthMm / 2;
  const items: DrawingItem[] = [
    { type: 'path', layer: 'guide', dashed: true, commands: [{ op: 'M', x: 3, y: -r + 3 }, { op: 'L', x: lengthMm - r, y: -r + 3 }] },
    { type: 'path', layer: 'cut', commands: outline(lengthMm, widthMm) },
  ];
  if (foldAtMm !== undefined) {
    items.push({ type: 'path', layer: 'fold', dashed: true, commands: [{ op: 'M', x: foldAtMm, y: -r }, { op: 'L', x: foldAtMm, y: r }] });
    items.push({ type: 'path', layer: 'punch', commands: [{ op: 'M', x: foldAtMm - 10, y: -2 }, { op: 'L', x: foldAtMm + 10, y: -2 }, { op: 'L', x: foldAtMm + 10, y: 2 }, { op: 'L', x: foldAtMm - 10, y: 2 }, { op: 'Z' }] });
    items.push({ type: 'text', layer: 'label', x: foldAtMm, y: -r - 1.5, text: `fold ${foldAtMm.toFixed(1)}`, sizeMm: 2, anchor: 'middle' });
  }
  for (const x of holesAtMm) {
    items.push({ type: 'circle', layer: 'punch', cx: x, cy: 0, r: 2.38125 });
    items.push({ type: 'text', layer: 'label', x, y: r + 3.5, text: `${x.toFixed(1)} · 3/16 in`, sizeMm: 1.8, anchor: 'middle' });
  }
  return { id, name, lengthMm, widthMm, bounds: { minX: 0, maxX: lengthMm, minY: -r - 4, maxY: r + 4.5 }, items };
}

function title(pattern: string, girth: string, width: string): Drawing['title'] {
  return { pattern, revision: 'rev 3', size: 'M', girth, width, leather: '8-9 oz (3.2-3.6 mm) veg tan', date: '2026-12-01', units: 'in' };
}

/** A 21 in (533.4 mm) collar blank, 1 in wide, five holes 3/4 in apart. */
export function collarDrawing(): Drawing {
  const holes = [0, 1, 2, 3, 4].map((i) => 400 + i * 19.05);
  return { title: title('Juniper collar', '15 in neck', '1 in'), pieces: [stripPiece('strap', 'Collar, 15 in neck', 533.4, 25.4, holes, 60)] };
}

/** A 48 in (1219.2 mm) belt blank, 1 1/2 in wide, five holes 1 in apart. */
export function beltDrawing(): Drawing {
  const holes = [0, 1, 2, 3, 4].map((i) => 990 + i * 25.4);
  return { title: title('Tobias work belt', '44 in waist', '1 1/2 in'), pieces: [stripPiece('strap', 'Belt, 44 in waist', 1219.2, 38.1, holes, 90)] };
}

/** A 20 mm watch strap: long piece 120 mm with holes, short piece 75 mm with a buckle fold. */
export function watchDrawing(): Drawing {
  return {
    title: { pattern: 'Ilse watch strap', revision: 'rev 1', girth: '165 mm wrist', width: '20 mm', leather: '2-3 oz (1 mm) two layers', date: '2026-12-01', units: 'mm' },
    pieces: [
      stripPiece('long', 'Watch strap, long piece', 120, 20, [60, 67, 74, 81, 88]),
      stripPiece('short', 'Watch strap, short piece', 75, 20, [], 12),
    ],
  };
}

/** Five collar sizes, XS to XL, 2 in (50.8 mm) apart in blank length. */
export function collarRunDrawing(): Drawing {
  const names = ['XS', 'S', 'M', 'L', 'XL'];
  const pieces = names.map((n, i) => {
    const len = 381 + i * 50.8;
    return stripPiece(`strap-${n}`, `Collar ${n}`, len, 25.4, [0, 1, 2, 3, 4].map((k) => len - 120 + k * 19.05), 60);
  });
  return { title: { ...title('Juniper collar run', '11-19 in neck', '1 in'), size: 'XS-XL' }, pieces };
}
