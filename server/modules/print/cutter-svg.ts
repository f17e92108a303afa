import type { Drawing, DrawingPiece, PathCommand } from '@shared/render/drawing.ts';

/** Stroke colour per cutter operation (our own choice): one colour = one machine pass. */
export const CUTTER_COLORS = { cut: '#d7191c', punch: '#2c7bb6' } as const;
/** Hairline stroke for laser and blade cutters: 0.001 in, in mm. */
export const HAIRLINE_MM = 0.0254;
/** Space between pieces when a drawing has several, mm. */
export const CUTTER_GAP_MM = 5;

/** Fixed digits (µm) so the same drawing gives the same text. */
function n(v: number): string {
  const s = v.toFixed(3);
  return s === '-0.000' ? '0.000' : s;
}

function pathData(cmds: readonly PathCommand[], dy: number): string {
  return cmds
    .map((c) => {
      if (c.op === 'Z') return 'Z';
      if (c.op === 'C') return `C${n(c.x1)} ${n(c.y1 + dy)} ${n(c.x2)} ${n(c.y2 + dy)} ${n(c.x)} ${n(c.y + dy)}`;
      return `${c.op}${n(c.x)} ${n(c.y + dy)}`;
    })
    .join(' ');
}

function isClosed(cmds: readonly PathCommand[]): boolean {
  return cmds.length > 1 && cmds[cmds.length - 1]?.op === 'Z';
}

function pieceGroup(p: DrawingPiece, top: number): string {
  // The piece frame has its centreline at y = 0; the sheet puts the blank's top edge at `top`.
  const dy = top + p.widthMm / 2;
  const cut: string[] = [];
  const punch: string[] = [];
  for (const item of p.items) {
    if (item.layer !== 'cut' && item.layer !== 'punch') continue;
    const out = item.layer === 'cut' ? cut : punch;
    if (item.type === 'circle') out.push(`<circle cx="${n(item.cx)}" cy="${n(item.cy + dy)}" r="${n(item.r)}"/>`);
    // Open paths on the punch layer are centre crosses (marks for a hand punch), not cuts.
    else if (item.type === 'path' && isClosed(item.commands)) out.push(`<path d="${pathData(item.commands, dy)}"/>`);
  }
  const id = p.id.replace(/[^A-Za-z0-9_-]/g, '_');
  const group = (op: 'cut' | 'punch', body: string[]) =>
    body.length === 0 ? '' : `<g id="${id}-${op}" stroke="${CUTTER_COLORS[op]}">${body.join('')}</g>`;
  return `<g id="${id}">${group('cut', cut)}${group('punch', punch)}</g>`;
}

/**
 * The cutter export: cut and punch geometry only (closed outlines, slots and holes; no labels,
 * guides, folds or centre crosses), one stroke
 * colour per operation, hairline strokes, at 1:1 in mm. A one-piece drawing gives a sheet of
 * exactly the blank's size (lengthMm x widthMm); several pieces stack with a 5 mm gap.
 */
export function buildCutterSvg(drawing: Drawing): string {
  let top = 0;
  const groups: string[] = [];
  let width = 0;
  drawing.pieces.forEach((p, i) => {
    if (i > 0) top += CUTTER_GAP_MM;
    groups.push(pieceGroup(p, top));
    top += p.widthMm;
    width = Math.max(width, p.lengthMm);
  });
  const height = top;
  return (
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(width)}mm" height="${n(height)}mm" viewBox="0 0 ${n(width)} ${n(height)}">` +
    `<g fill="none" stroke-width="${n(HAIRLINE_MM)}" stroke-linejoin="round">${groups.join('')}</g></svg>\n`
  );
}
