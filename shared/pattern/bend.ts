/**
 * Fold geometry. Leather folded round a bar is modelled as sheet metal bent round a die:
 * bend allowance BA = angle x (R + K x T), angle in radians (Machinery's Handbook,
 * sheet-metal practice). R is the inside radius (the bar's radius), T the thickness, K the
 * neutral-axis position as a fraction of T from the inside face.
 *
 * K = 0.5 by default: veg-tan compresses on the inside of a fold about as much as it
 * stretches on the outside, so the length-keeping line stays near mid-thickness. That is
 * our own, documented assumption; no leather reference gives a fold allowance. Users may
 * change K in the spec.
 */

/** Bend allowance in mm: `angleRad` x (`radiusMm` + `k` x `thicknessMm`). */
export function bendAllowanceMm(angleRad: number, radiusMm: number, thicknessMm: number, k: number): number {
  return angleRad * (radiusMm + k * thicknessMm);
}

/**
 * Inner circumference (mm) of a closed loop whose centreline is `centrelineMm` long and
 * whose material is `thicknessMm` thick: C_inner = C_centre - pi x T (circle geometry: the
 * inner face lies T/2 inside the centreline all round).
 */
export function innerCircumferenceMm(centrelineMm: number, thicknessMm: number): number {
  return centrelineMm - Math.PI * thicknessMm;
}

/** Centreline length (mm) of a closed loop with the given inner circumference. */
export function centrelineFromInnerMm(innerMm: number, thicknessMm: number): number {
  return innerMm + Math.PI * thicknessMm;
}
