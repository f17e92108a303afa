import { formatLength } from '@shared/units/format-length.ts';

/** A length for labels in the pattern's units; inches also show mm, since the print is metric-checked. */
export function fmtLength(mm: number, units: 'in' | 'mm'): string {
  return units === 'in' ? `${formatLength(mm, 'in')} (${formatLength(mm, 'mm')})` : formatLength(mm, 'mm');
}
