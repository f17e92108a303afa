// The server's one door into the engine: layouts and drawings of saved specs, with the
// engine's "impossible geometry" errors turned into 400s naming the spec field.
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { badInput } from '../../http/http-error.ts';

function engineErrorToBadInput(err: unknown, field: (e: EngineError) => string, lead = ''): never {
  if (err instanceof EngineError) {
    const name = field(err);
    const limit = err.limit ? ` (limit: ${err.limit})` : '';
    throw badInput({ [name]: `${name}: ${lead}${err.message}${limit}` });
  }
  throw err;
}

/**
 * Layout of `spec`; an EngineError becomes 400 with the field `${prefix}.${field}`. Every size
 * of the spec's size run is laid out too, so a revision that saves is a revision that prints:
 * a size the engine cannot draw is refused naming `${prefix}.sizes.N.girthMm`.
 */
export function layoutOrBadInput(spec: StrapSpec, prefix = 'spec'): PatternLayout {
  let layout: PatternLayout;
  try {
    layout = computeLayout(spec);
  } catch (err) {
    engineErrorToBadInput(err, (e) => `${prefix}.${e.field}`);
  }
  (spec.sizes ?? []).forEach((size, i) => {
    try {
      computeLayout({ ...spec, girthMm: size.girthMm });
    } catch (err) {
      engineErrorToBadInput(err, () => `${prefix}.sizes.${i}.girthMm`, `size ${size.name}: `);
    }
  });
  return layout;
}

/** Layout and Drawing of a stored spec, labelled with the revision for the title block. */
export function drawingOf(spec: StrapSpec, revision: { number: number; createdAt: Date }): { layout: PatternLayout; drawing: Drawing } {
  const layout = layoutOrBadInput(spec);
  const drawing = drawLayout(layout, spec, { revision: `rev ${revision.number}`, date: revision.createdAt.toISOString().slice(0, 10) });
  return { layout, drawing };
}
