// The proof's drawing: the outline and folds of the fitted piece, full size in mm, with no
// labels, holes or punch marks, so it shows the shape and never the making (no punch sizes,
// no hole positions to copy, no cutter geometry).
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import { renderSvg } from '@shared/render/svg.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';

const SHOWN = new Set(['cut', 'fold']);

export function proofSvg(layout: PatternLayout, spec: StrapSpec): string {
  const full = drawLayout(layout, spec, { labels: false });
  const outline: Drawing = {
    ...full,
    pieces: full.pieces.map((p) => ({ ...p, items: p.items.filter((i) => SHOWN.has(i.layer) && i.type === 'path') })),
  };
  // renderSvg writes the markup itself; no DOM is needed.
  return renderSvg(outline, undefined, { titleBlock: false });
}
