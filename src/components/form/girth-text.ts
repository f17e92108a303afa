import type { GirthUnit } from '@shared/schemas/measure-kinds.ts';
import { textToLengthMm } from './length-text.ts';

/**
 * What a person typed as a girth, in the unit the form shows, as mm: inches accept fractions
 * ("14 1/2", "14.5"), centimetres and millimetres decimals with a point or a comma. Not a
 * number gives NaN, which the shared schema names ("Girth must be a number").
 */
export function girthTextToMm(text: string, unit: GirthUnit): number {
  const t = text.trim().replace(/(\d),(\d)/, '$1.$2');
  if (t === '') return Number.NaN;
  if (unit === 'in') return textToLengthMm(t.replace(/\s*(in|inch|inches|")$/i, ''), 'in');
  const n = Number(t.replace(/\s*(cm|mm)$/i, ''));
  if (!Number.isFinite(n)) return Number.NaN;
  return unit === 'cm' ? Math.round(n * 100) / 10 : n;
}
