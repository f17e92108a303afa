import { MM_PER_IN } from '../units/length.ts';
import type { PunchSize } from './layout-types.ts';

/** Largest numbered round drive punch we list. */
export const PUNCH_MAX_NUMBER = 15;

/**
 * Diameter in mm of round drive punch number `n`: #0 = 5/64 in (leathercraft handbook);
 * each number up adds 1/64 in (from memory), so #3 = 1/8 in and #7 = 3/16 in.
 */
export function punchDiameterMm(n: number): number {
  return ((5 + n) / 64) * MM_PER_IN;
}

/** The numbered punch nearest to `diameterMm` (ties go to the smaller punch). */
export function nearestPunch(diameterMm: number): PunchSize {
  const n = Math.min(PUNCH_MAX_NUMBER, Math.max(0, Math.round((diameterMm / MM_PER_IN) * 64 - 5 - 1e-9)));
  return { size: `#${n}`, diameterMm: punchDiameterMm(n) };
}
