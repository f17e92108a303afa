import type { LayerName } from './drawing.ts';

// ".000" to ".999", made once: padding and joining the thousandths for every number made three
// short strings each, and a collar SVG writes some 600 numbers (the writer allocated ten times
// the bytes it wrote; garbage collection was 6 % of a collar SVG's CPU profile).
const DECIMALS = Array.from({ length: 1000 }, (_, i) => `.${String(i).padStart(3, '0')}`);

/**
 * A number as SVG text: 3 fixed decimals (0.001 mm), never "-0.000". Halves round away from
 * zero so an outline symmetric about the centreline stays symmetric in the file.
 */
export function svgNumber(v: number): string {
  // Round to the micrometre first: 2.7625 may arrive as 2.76249999999 on one edge and
  // 2.76250000001 on the other, and must print the same on both.
  const um = Math.round(Math.abs(v) * 1e6);
  const k = Math.round(um / 1000); // thousandths, >= 0
  // Written from the integer: what toFixed(3) gives for k / 1000, without its cost (every
  // coordinate of every SVG passes here; it was an eighth of the SVG writer's profile).
  if (k < 1e12) {
    if (k === 0) return '0.000';
    const whole = Math.floor(k / 1000);
    const tail = DECIMALS[k - whole * 1000]!;
    return v < 0 ? `-${whole}${tail}` : `${whole}${tail}`;
  }
  const s = ((Math.sign(v) * k) / 1000).toFixed(3);
  return s === '-0.000' ? '0.000' : s;
}

/** Presentation attributes per layer (mm strokes; cut is the one line to follow with the knife). */
export function layerStyle(layer: LayerName): Record<string, string> {
  switch (layer) {
    case 'cut':
      return { fill: 'none', stroke: '#000000', 'stroke-width': '0.300' };
    case 'punch':
      return { fill: 'none', stroke: '#000000', 'stroke-width': '0.200' };
    case 'fold':
      return { fill: 'none', stroke: '#1f5fa8', 'stroke-width': '0.250', 'stroke-dasharray': '3.000 1.500' };
    case 'guide':
      return { fill: 'none', stroke: '#7a7a7a', 'stroke-width': '0.150', 'stroke-dasharray': '1.000 1.000' };
    case 'label':
      return { fill: '#000000', stroke: 'none', 'font-family': 'IBM Plex Sans, sans-serif' };
  }
}
