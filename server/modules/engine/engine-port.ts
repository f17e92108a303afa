// The server's one door into the engine: layouts and drawings of saved specs, with the
// engine's "impossible geometry" errors turned into 400s naming the spec field.
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { badInput } from '../../http/http-error.ts';

/** Layout of `spec`; an EngineError becomes 400 with the field `${prefix}.${field}`. */
export function layoutOrBadInput(spec: StrapSpec, prefix = 'spec'): PatternLayout {
  try {
    return computeLayout(spec);
  } catch (err) {
    if (err instanceof EngineError) {
      const field = `${prefix}.${err.field}`;
      const limit = err.limit ? ` (limit: ${err.limit})` : '';
      throw badInput({ [field]: `${field}: ${err.message}${limit}` });
    }
    throw err;
  }
}

/** Layout and Drawing of a stored spec, labelled with the revision for the title block. */
export function drawingOf(spec: StrapSpec, revision: { number: number; createdAt: Date }): { layout: PatternLayout; drawing: Drawing } {
  const layout = layoutOrBadInput(spec);
  const drawing = drawLayout(layout, spec, { revision: `rev ${revision.number}`, date: revision.createdAt.toISOString().slice(0, 10) });
  return { layout, drawing };
}
