import { computeLayout, gradeSizes, specAtGirth, type SizeRunReport } from '@shared/pattern/index.ts';
import { EngineError } from '@shared/pattern/engine-error.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import { formatLength } from '@shared/units/format-length.ts';

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
    if (err instanceof EngineError) return { status: 'stopped', field: err.field, message: sizeThatStops(spec) + err.message };
    return { status: 'stopped', field: 'sizes', message: err instanceof Error ? err.message : String(err) };
  }
}

/**
 * "Size L (2 in): " for the first size that cannot be drawn on its own, as the server's
 * refused save says it, so the run panel names which size to change; '' if none alone fails.
 */
function sizeThatStops(spec: StrapSpec): string {
  const size = spec.sizes.find((s) => {
    try {
      computeLayout(specAtGirth(spec, { sizeName: s.name }));
      return false;
    } catch {
      return true;
    }
  });
  return size ? `Size ${size.name} (${formatLength(size.girthMm, spec.units)}): ` : '';
}
