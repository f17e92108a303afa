import { specAtGirth, type StrapSpec } from '@shared/pattern/index.ts';
import type { SizeSpec } from '@shared/schemas/strap-spec.ts';
import { PrintOptionsError } from './print-options.ts';

/** One graded size: a name, the girth it is drafted for (mm), and any graded width, holes or hardware. */
export type SizeDef = SizeSpec;

/** The value of `size` that prints every size of the run. */
export const ALL_SIZES = 'all';

/**
 * The specs to print: the spec as given when no size is asked for, one size of the run by
 * name, or every size (`all`), each at its own girth. Unknown sizes name the field.
 */
export function specsForSize(spec: StrapSpec, size: string | undefined, sizes: readonly SizeDef[] | undefined): { size?: string; spec: StrapSpec }[] {
  if (size === undefined) return [{ spec }];
  const run = sizes ?? [];
  if (run.length === 0) throw new PrintOptionsError(`Size: this pattern has no size run (asked for "${size}")`, [{ field: 'size', message: `Size: this pattern has no size run (asked for "${size}")` }]);
  const pick = size.toLowerCase() === ALL_SIZES ? [...run].sort((a, b) => a.girthMm - b.girthMm) : run.filter((s) => s.name.toLowerCase() === size.toLowerCase());
  if (pick.length === 0) {
    const msg = `Size: "${size}" is not in the run (${run.map((s) => s.name).join(', ')}, or ${ALL_SIZES})`;
    throw new PrintOptionsError(msg, [{ field: 'size', message: msg }]);
  }
  // Each size with its graded width, holes and hardware (specAtGirth), not only its girth.
  return pick.map((s) => ({ size: s.name, spec: specAtGirth({ ...spec, sizes: [...run] }, { sizeName: s.name }) }));
}
