import { MM_PER_IN } from './units.ts';

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Inches to the nearest 1/16 in, as the trade writes them: "21 in", "1 3/16 in", "3/8 in". */
export function fmtInches(mm: number): string {
  const sixteenths = Math.round((mm / MM_PER_IN) * 16);
  const sign = sixteenths < 0 ? '-' : '';
  const n = Math.abs(sixteenths);
  const whole = Math.floor(n / 16);
  const rest = n % 16;
  if (rest === 0) return `${sign}${whole} in`;
  const g = gcd(rest, 16);
  const frac = `${rest / g}/${16 / g}`;
  return `${sign}${whole > 0 ? `${whole} ` : ''}${frac} in`;
}

/** A length for labels in the pattern's units; inches also show mm, since the print is metric-checked. */
export function fmtLength(mm: number, units: 'in' | 'mm'): string {
  return units === 'in' ? `${fmtInches(mm)} (${mm.toFixed(1)} mm)` : `${mm.toFixed(1)} mm`;
}
