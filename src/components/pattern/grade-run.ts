import { gradeSizes, type SizeRunReport } from '@shared/pattern/index.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';

/** The run graded by the engine, or the sentence that stopped it. */
export type SizeRunResult = { status: 'graded'; report: SizeRunReport } | { status: 'stopped'; field: string; message: string };

/** Grades the spec's size run; a run needs adjustment holes for its fit ranges. */
export function gradeRun(spec: StrapSpec): SizeRunResult | null {
  if (spec.sizes.length === 0) return null;
  const strap = spec.pieces.find((p) => p.role === 'strap');
  if (strap?.end.kind !== 'adjustable') {
    return { status: 'stopped', field: 'sizes', message: 'a size run grades the fit at the tip holes; this strap has no adjustment holes' };
  }
  try {
    return { status: 'graded', report: gradeSizes(spec, spec.sizes) };
  } catch (err) {
    if (err instanceof EngineError) return { status: 'stopped', field: err.field, message: err.message };
    return { status: 'stopped', field: 'sizes', message: err instanceof Error ? err.message : String(err) };
  }
}
