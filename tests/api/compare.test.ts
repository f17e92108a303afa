// Comparing revisions: changed parameters with units, and the layouts' differences.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { computeLayout } from '@shared/pattern/compute-layout.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { layoutDiff } from '../../server/modules/compare/layout-diff.ts';
import { specChanges } from '../../server/modules/compare/spec-diff.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';

let t: TestApp;
let w: ShopWorld;
beforeEach(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterEach(async () => {
  await t.close();
});

describe('compare route', () => {
  it('when the girth grows by 1 in (25.4 mm, exact by the 1959 yard and pound agreement), then the girth change and the moved holes are reported', async () => {
    const base = presetSpec('collar');
    const bigger = { ...base, girthMm: base.girthMm + 25.4 };
    await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', w.collar.etag).send({ spec: bigger, note: 'an inch more' }).expect(201);
    const res = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}/compare?from=1&to=2`).set('Cookie', w.apprentice.cookie).expect(200);
    expect(res.body.params).toEqual([{ path: 'girthMm', from: base.girthMm, to: base.girthMm + 25.4, unit: 'mm' }]);
    const strap = res.body.layout.pieces.find((p: { pieceId: string }) => p.pieceId === 'strap');
    // Rule mode: blank = girth + allowance (common practice), so the blank grows by the same inch.
    expect(strap.blankLengthMm.deltaMm).toBeCloseTo(25.4, 6);
    // The adjustment holes are placed from the tip, so they all move with the tip.
    const holes = strap.moved.filter((m: { kind: string }) => m.kind === 'adjust-hole');
    expect(holes.length).toBe(base.pieces[0]!.end.kind === 'adjustable' ? base.pieces[0]!.end.holes.count : 0);
    for (const h of holes) expect(h.deltaAtMm).toBeCloseTo(25.4, 6);
  });

  it('when from or to is past the head or not a number, then 400 names it', async () => {
    const past = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}/compare?from=1&to=4`).set('Cookie', w.owner.cookie).expect(400);
    expect(past.body.error.fields).toHaveProperty('to');
    const nan = await request(t.app).get(`/api/patterns/${w.collar.pattern.id}/compare?from=x&to=1`).set('Cookie', w.owner.cookie).expect(400);
    expect(nan.body.error.fields).toHaveProperty('from');
  });
});

describe('diff functions', () => {
  it('when the thickness value changes, then its unit comes from the spec beside it', () => {
    const a = presetSpec('collar');
    const b = { ...a, thickness: { unit: 'oz' as const, value: 8 } };
    expect(specChanges(a, b)).toEqual([{ path: 'thickness.value', from: 10, to: 8, unit: 'oz' }]);
  });

  it('when the same spec is compared with itself, then nothing differs', () => {
    const a = presetSpec('belt');
    expect(specChanges(a, structuredClone(a))).toEqual([]);
    const layout = computeLayout(a);
    expect(layoutDiff(layout, computeLayout(structuredClone(a))).pieces).toEqual([]);
  });

  it('when a hole is added, then it is listed as added and nothing else moves', () => {
    const a = presetSpec('collar');
    const b = structuredClone(a);
    const end = b.pieces[0]!.end;
    if (end.kind !== 'adjustable') throw new Error('collar preset changed: tip is not adjustable');
    end.holes.count += 1;
    const diff = layoutDiff(computeLayout(a), computeLayout(b));
    const strap = diff.pieces.find((p) => p.pieceId === 'strap')!;
    expect(strap.added.filter((f) => f.kind === 'adjust-hole')).toHaveLength(1);
    expect(strap.removed).toEqual([]);
  });
});
