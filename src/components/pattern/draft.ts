import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { drawLayout } from '@shared/pattern/draw-layout.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { PatternLayout } from '@shared/pattern/layout-types.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { specIssueMessages } from '@shared/schemas/spec-messages.ts';
import { StrapSpecSchema, type StrapSpec } from '@shared/schemas/strap-spec.ts';

/** A field that stops the drawing (its path, to place it) and the sentence a person reads. */
export interface DraftProblem {
  field: string;
  message: string;
}

/** What the live preview shows for the form's current values. */
export type Draft =
  | { status: 'drawn'; spec: StrapSpec; layout: PatternLayout; svg: string }
  /** `by`: the schema refused a value (nothing to save or print yet), or the engine could not draw it. */
  | { status: 'stopped'; by: 'schema' | 'engine'; problems: DraftProblem[] };

/**
 * Runs the engine in the browser: validate with the shared schema, compute the Layout, draw
 * it, render SVG with the page's own DOM. Same code and bytes as the server's export.
 */
export function draftFrom(values: unknown, opts: { revision?: string; dom?: { window: unknown; document: unknown } } = {}): Draft {
  const parsed = StrapSpecSchema.safeParse(values);
  if (!parsed.success) {
    // The same words as the field's own message: its label, the limit in the form's unit.
    return {
      status: 'stopped',
      by: 'schema',
      problems: specIssueMessages(parsed.error, values)
        .slice(0, 6)
        .map((m) => ({ field: m.path || 'spec', message: m.message })),
    };
  }
  try {
    const layout = computeLayout(parsed.data);
    const drawing = drawLayout(layout, parsed.data, opts.revision ? { revision: opts.revision } : {});
    // The screen has its own header; the title block and calibration bars belong on paper.
    const svg = renderSvg(drawing, opts.dom ?? { window, document }, { titleBlock: false });
    return { status: 'drawn', spec: parsed.data, layout, svg };
  } catch (err) {
    // Impossible geometry names its field and limit; anything else is a bug worth showing.
    if (err instanceof EngineError) return { status: 'stopped', by: 'engine', problems: [{ field: err.field, message: err.message }] };
    return { status: 'stopped', by: 'engine', problems: [{ field: 'spec', message: err instanceof Error ? err.message : String(err) }] };
  }
}
