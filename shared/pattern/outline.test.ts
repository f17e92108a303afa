import { describe, expect, it } from 'vitest';
import type { PieceSpec } from '../schemas/strap-spec.ts';
import { englishPointRadiusMm } from './end-shape.ts';
import { insetChain } from './offset.ts';
import { pieceOutline } from './outline.ts';
import { chainArea, chainLength, primEnd, primStart } from './prims.ts';
import { widthProfile } from './width-profile.ts';

const W = 30;
const L = 200;
const piece = (end: PieceSpec['end']['shape'], start: PieceSpec['start']['shape'] = { kind: 'square' }): PieceSpec => ({
  id: 'p', name: 'p', role: 'strap', count: 1, length: { kind: 'girth' },
  start: { kind: 'plain', holes: [], shape: start }, end: { kind: 'plain', holes: [], shape: end }, taper: [], stitchRows: [],
});
const outline = (p: PieceSpec) => pieceOutline(widthProfile(p, W, L), p.start.shape, p.end.shape);

describe('outline primitives (exact arcs)', () => {
  it('when both ends are English points of depth d, then the exact area is the rectangle plus two closed-form points (circle segments)', () => {
    const d = 24, h = W / 2, r = englishPointRadiusMm(d, W);
    const t = Math.acos(1 - h / r);
    const tipArea = d * h + r * r * (t - Math.sin(t));
    const o = outline(piece({ kind: 'english-point', depthMm: d }, { kind: 'english-point', depthMm: d }));
    expect(chainArea(o)).toBeCloseTo((L - 2 * d) * W + 2 * tipArea, 6);
    expect(chainLength(o)).toBeCloseTo(2 * (L - 2 * d) + 4 * r * t, 6);
  });

  it('when an outline is built, then it is closed and every primitive starts where the one before ends', () => {
    for (const shape of [{ kind: 'round' as const }, { kind: 'clipped' as const, chamferMm: 5 }, { kind: 'spear' as const, depthMm: 20 }]) {
      const o = outline(piece(shape, shape));
      o.forEach((p, i) => {
        const prev = primEnd(o[(i + o.length - 1) % o.length]!);
        const s = primStart(p);
        expect(Math.hypot(prev.x - s.x, prev.y - s.y)).toBeLessThan(1e-9);
      });
    }
  });

  it('when a rectangle is inset by g, then the area is (L - 2g)(W - 2g) and a semicircle end shrinks to radius h - g', () => {
    const g = 3;
    expect(chainArea(insetChain(outline(piece({ kind: 'square' })), g))).toBeCloseTo((L - 2 * g) * (W - 2 * g), 6);
    const round = insetChain(outline(piece({ kind: 'round' })), g);
    const arcs = round.filter((p) => p.type === 'arc');
    for (const a of arcs) expect(a.type === 'arc' && a.r).toBeCloseTo(W / 2 - g, 9);
  });
});
