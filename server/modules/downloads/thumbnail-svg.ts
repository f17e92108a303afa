// The library card's thumbnail: a saved revision's pieces as small filled shapes (outline,
// holes and slots, fold lines), no labels or guides, which could not be read at card size.
import type { Drawing, DrawingPiece, PathCommand } from '@shared/render/drawing.ts';

/** Space between stacked pieces, mm. */
const GAP_MM = 4;
// Our own palette (src/styles.css): hide-200 leather, hide-800 edges, paper for holes.
const LEATHER = '#e0c6a4';
const EDGE = '#4b3020';
const HOLE = '#fbf7f0';

const n = (v: number) => (Math.round(v * 100) / 100).toString();

function d(cmds: readonly PathCommand[], dy: number): string {
  return cmds
    .map((c) => (c.op === 'Z' ? 'Z' : c.op === 'C' ? `C${n(c.x1)} ${n(c.y1 + dy)} ${n(c.x2)} ${n(c.y2 + dy)} ${n(c.x)} ${n(c.y + dy)}` : `${c.op}${n(c.x)} ${n(c.y + dy)}`))
    .join('');
}

function piece(p: DrawingPiece, top: number): string {
  const dy = top + p.widthMm / 2;
  const out: string[] = [];
  let outlined = false;
  for (const item of p.items) {
    if (item.type === 'text' || (item.layer !== 'cut' && item.layer !== 'punch' && item.layer !== 'fold')) continue;
    // Stitch holes (under 1 mm across) vanish at card size and would only bloat the file.
    if (item.type === 'circle' && item.r < 0.5) continue;
    if (item.type === 'circle') out.push(`<circle cx="${n(item.cx)}" cy="${n(item.cy + dy)}" r="${n(item.r)}" fill="${HOLE}"/>`);
    else if (item.layer === 'fold') out.push(`<path d="${d(item.commands, dy)}" fill="none" stroke-dasharray="3 2"/>`);
    // The outline is the first closed cut path; later closed cut or punch paths are slots.
    else if (item.commands.at(-1)?.op === 'Z') {
      // Painted under everything else, so holes drawn before it stay visible.
      if (!outlined && item.layer === 'cut') out.unshift(`<path d="${d(item.commands, dy)}" fill="${LEATHER}"/>`);
      else out.push(`<path d="${d(item.commands, dy)}" fill="${HOLE}"/>`);
      outlined ||= item.layer === 'cut';
    }
  }
  return out.join('');
}

/**
 * A small SVG of every piece stacked, in mm (the viewBox is the blanks' extent), strokes one
 * screen pixel wide whatever the scale. The card sizes it with CSS.
 */
export function buildThumbnailSvg(drawing: Drawing): string {
  let top = 0;
  let width = 0;
  const parts = drawing.pieces.map((p, i) => {
    if (i > 0) top += GAP_MM;
    const g = piece(p, top);
    top += p.widthMm;
    width = Math.max(width, p.lengthMm);
    return g;
  });
  const pad = 1;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${n(-pad)} ${n(-pad)} ${n(width + 2 * pad)} ${n(top + 2 * pad)}">` +
    `<g stroke="${EDGE}" stroke-width="1" vector-effect="non-scaling-stroke" stroke-linejoin="round">${parts.join('')}</g></svg>`
  );
}
