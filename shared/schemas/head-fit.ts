import type { StrapSpec } from './strap-spec.ts';

/**
 * What a library card says of a pattern's fit: the head revision's girth, or the girth range
 * of its size run, with the display unit to show them in. Lengths in mm.
 */
export interface HeadFit {
  units: StrapSpec['units'];
  girthMm: number;
  /** False for straps that do not close round the body (bag strap, leash): the girth is their working length. */
  closes: boolean;
  /** Present when the head has a size run: how many sizes and their smallest and largest girth. */
  run?: { count: number; minGirthMm: number; maxGirthMm: number };
}

/** The card's fit summary of a stored spec (read defensively: older specs may lack `sizes`). */
export function headFit(spec: Pick<StrapSpec, 'units' | 'girthMm' | 'closes'> & { sizes?: readonly { girthMm: number }[] }): HeadFit {
  const girths = (spec.sizes ?? []).map((s) => s.girthMm);
  return {
    units: spec.units,
    girthMm: spec.girthMm,
    closes: spec.closes !== false,
    ...(girths.length > 0 ? { run: { count: girths.length, minGirthMm: Math.min(...girths), maxGirthMm: Math.max(...girths) } } : {}),
  };
}
