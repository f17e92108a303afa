import { describe, expect, it } from 'vitest';
import { EndShapeSchema } from '@shared/schemas/strap-spec.ts';
import { reshapeEnd } from './reshape-end.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)
const KINDS = ['square', 'round', 'clipped', 'english-point', 'spear'] as const;

describe('changing the shape of a strap end', () => {
  it('when any shape is chosen for a 1 in strap, then the new shape passes the shared EndShapeSchema', () => {
    for (const from of KINDS) {
      const current = reshapeEnd(undefined, from, IN);
      for (const to of KINDS) expect(EndShapeSchema.safeParse(reshapeEnd(current, to, IN)).success, `${from} -> ${to}`).toBe(true);
    }
  });

  it('when round is chosen, then the radius is half the width: a semicircle (the schema\'s round tip)', () => {
    const shape = reshapeEnd({ kind: 'square' }, 'round', 1.5 * IN);
    expect(shape.kind).toBe('round');
    expect(shape.kind === 'round' ? shape.radiusMm : undefined).toBeCloseTo(0.75 * IN, 6);
  });

  it('when an English point becomes a spear, then its point depth carries over', () => {
    expect(reshapeEnd({ kind: 'english-point', depthMm: 30 }, 'spear', IN)).toEqual({ kind: 'spear', depthMm: 30 });
  });

  it('when a shallow spear becomes an English point, then the depth grows to half the width, the least two tangent arcs can meet at (circle geometry)', () => {
    const shape = reshapeEnd({ kind: 'spear', depthMm: 5 }, 'english-point', IN);
    expect(shape).toEqual({ kind: 'english-point', depthMm: IN / 2 });
  });
});
