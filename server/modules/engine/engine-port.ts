// The server's one door into the engine: layouts and drawings of saved specs, with the
// engine's "impossible geometry" errors turned into 400s naming the spec field.
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import { specAtGirth } from '@shared/pattern/spec-at-girth.ts';
import { formatLength } from '@shared/units/format-length.ts';
import type { Drawing } from '@shared/render/drawing.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { badInput } from '../../http/http-error.ts';

/** An EngineError as a 400: keyed by the field's path, worded with its label (the engine's message). */
function engineErrorToBadInput(err: unknown, field: (e: EngineError) => string, lead = ''): never {
  if (err instanceof EngineError) throw badInput({ [field(err)]: `${lead}${err.message}` });
  throw err;
}

/**
 * Layout of `spec`; an EngineError becomes 400 with the field `${prefix}.${field}`. Every size
 * of the spec's size run is laid out too (with its graded width, holes and hardware), so a
 * revision that saves is a revision that prints: a size that cannot be drawn is refused under
 * `${prefix}.sizes.N.girthMm`, the message naming the size ("Size M (13 in): ...").
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
      computeLayout(specAtGirth(spec, { sizeName: size.name }));
    } catch (err) {
      engineErrorToBadInput(err, () => `${prefix}.sizes.${i}.girthMm`, `Size ${size.name} (${formatLength(size.girthMm, spec.units)}): `);
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
