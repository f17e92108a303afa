import { describe, expect, it } from 'vitest';
import { svgSizeMm, zoomAbout, type View } from './use-pan-zoom.ts';

const at = (v: View, px: number) => (px - v.x) / v.scale; // drawing mm under a box px

describe('zoom about a point', () => {
  it('when zoomed 2x about the pointer, then the drawing point under the pointer stays under it', () => {
    const v: View = { mode: 'fit', scale: 1.5, x: 10, y: 20 };
    const z = zoomAbout(v, 2, 300, 50, 0.5);
    expect(z.scale).toBe(3);
    expect(at(z, 300)).toBeCloseTo(at(v, 300), 9);
    expect((50 - z.y) / z.scale).toBeCloseTo((50 - v.y) / v.scale, 9);
    expect(z.mode).toBe('free');
  });

  it('when zoomed far in or out, then the scale stops at 40 px per mm and at the least given', () => {
    const v: View = { mode: 'free', scale: 30, x: 0, y: 0 };
    expect(zoomAbout(v, 10, 0, 0, 1).scale).toBe(40);
    expect(zoomAbout(v, 0.001, 0, 0, 1).scale).toBe(1);
  });

  it('when the SVG says width="533.4mm" height="40.2mm", then its size in mm is read from it', () => {
    expect(svgSizeMm('<svg xmlns="http://www.w3.org/2000/svg" width="533.4mm" height="40.2mm" viewBox="0 0 533.4 40.2">')).toEqual({ w: 533.4, h: 40.2 });
  });
});
