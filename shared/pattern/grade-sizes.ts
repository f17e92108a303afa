import type { SizeSpec, StrapSpec } from '../schemas/strap-spec.ts';
import { EngineError } from './engine-error.ts';
import { computeLayout } from './compute-layout.ts';
import type { Warning } from './layout-types.ts';
import { roundLayoutNumbers } from './round-layout.ts';
import { specAtGirth } from './spec-at-girth.ts';

/** One graded size. */
export interface SizeRow {
  name: string;
  girthMm: number;
  blankLengthMm: number;
  /** Strap width of this size (graded or the pattern's), mm. */
  widthMm: number;
  /** Inner lengths at the tightest and loosest hole, mm. */
  rangeMm: [number, number];
  nominalInnerMm: number;
  warnings: Warning[];
}

/** How the fit ranges of neighbouring sizes meet: a gap (no hole fits) or an overlap. */
export interface SizeJoin {
  between: [string, string];
  kind: 'gap' | 'overlap' | 'touch';
  /** Size of the gap or overlap, mm. */
  mm: number;
}

/** A size run graded from one pattern. */
export interface SizeRunReport {
  sizes: SizeRow[];
  joins: SizeJoin[];
}

/**
 * Grades one pattern into named sizes: the same spec at each girth (sorted by girth) with each
 * size's graded width, holes and hardware (see specAtGirth), each size's fit range, and the gap
 * or overlap between neighbouring ranges (mm). `sizes` defaults to the spec's own run.
 */
export function gradeSizes(spec: StrapSpec, sizes: readonly SizeSpec[] = spec.sizes): SizeRunReport {
  if (sizes.length === 0) throw new EngineError('sizes', 'a size run needs at least one size', 'at least 1 size');
  const rows: SizeRow[] = [...sizes]
    .sort((a, b) => a.girthMm - b.girthMm)
    .map((s) => {
      const one = specAtGirth({ ...spec, sizes: [s] }, { sizeName: s.name });
      const layout = computeLayout(one);
      const fit = layout.fit!;
      return {
        name: s.name,
        girthMm: s.girthMm,
        blankLengthMm: layout.pieces.find((p) => p.role === 'strap')!.blankLengthMm,
        widthMm: one.widthMm,
        rangeMm: fit.rangeMm,
        nominalInnerMm: fit.holes[fit.nominalIndex]!.innerMm,
        warnings: layout.warnings,
      };
    });
  const joins: SizeJoin[] = [];
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1]!, b = rows[i]!;
    const d = b.rangeMm[0] - a.rangeMm[1];
    joins.push({ between: [a.name, b.name], kind: Math.abs(d) < 0.05 ? 'touch' : d > 0 ? 'gap' : 'overlap', mm: Math.abs(d) });
  }
  return roundLayoutNumbers({ sizes: rows, joins });
}
