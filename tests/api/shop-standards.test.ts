// The shop's standards: everyone in the shop reads them, owners replace them, bad values are
// refused naming the field by its label, and a new pattern starts from the shop's standard.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { computeLayout } from '@shared/pattern/index.ts';
import { StrapSpecSchema } from '@shared/schemas/strap-spec.ts';
import type { ShopStandards, ShopStandardsView } from '@shared/schemas/shop-standards.ts';
import { getShopStandards } from '../../server/modules/standards/standards.repository.ts';
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

const read = async (cookie: string) => (await request(t.app).get('/api/shop/standards').set('Cookie', cookie).expect(200)).body as ShopStandardsView;

/** The shop's collar standard with 7 1/2 in allowance, 1/2 in ease and a 1 in brass buckle. */
function collarStandard(base: ShopStandards): ShopStandards {
  const brass = { id: 'brass-1in', kind: 'buckle' as const, name: 'Solid brass 1 in', insideWidthMm: 25.4, tongueLengthMm: 26, tongueWireMm: 3.5, buckleStyle: 'centre-bar' as const, unitCostCents: 450 };
  return {
    ...base,
    hardware: [...base.hardware, brass],
    kinds: { ...base.kinds, collar: { ...base.kinds.collar!, rule: { measure: 'blank', allowanceMm: 190.5 }, easeMm: 12.7, buckleId: 'brass-1in' } },
  };
}

describe('shop standards', () => {
  it('when nothing is saved, then every member reads the built-in standards: each kind as its preset, unpriced starter hardware', async () => {
    for (const m of [w.owner, w.maker, w.apprentice]) {
      const v = await read(m.cookie);
      expect(v.updatedAt).toBeNull();
      expect(v.standards.kinds.collar).toMatchObject({ rule: presetSpec('collar').rule, easeMm: presetSpec('collar').easeMm });
      expect(v.standards.hardware.some((h) => h.kind === 'buckle')).toBe(true);
    }
  });

  it('when the owner saves the collar standard, then the maker reads it back with who saved it, and getShopStandards returns it', async () => {
    const next = collarStandard((await read(w.owner.cookie)).standards);
    const saved = await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send(next).expect(200);
    expect(saved.body.updatedBy).toEqual({ id: w.owner.id, name: 'Maren Finch' });
    const v = await read(w.maker.cookie);
    expect(v.standards.kinds.collar).toMatchObject({ easeMm: 12.7, buckleId: 'brass-1in' });
    expect(Date.parse(v.updatedAt!)).not.toBeNaN();
    const direct = await getShopStandards(t.db, w.shopId);
    expect(direct.hardware.find((h) => h.id === 'brass-1in')?.unitCostCents).toBe(450);
    // Another shop still has the defaults.
    expect((await read(w.outsider.cookie)).updatedAt).toBeNull();
  });

  it('when a maker or an apprentice tries to change the standards, then 403 and nothing changes', async () => {
    const next = collarStandard((await read(w.owner.cookie)).standards);
    for (const m of [w.maker, w.apprentice]) await request(t.app).put('/api/shop/standards').set('Cookie', m.cookie).send(next).expect(403);
    expect((await read(w.owner.cookie)).updatedAt).toBeNull();
  });

  it('when values are out of range, then 400 names each field by its label with its limit, never a schema path or a camelCase name', async () => {
    const base = (await read(w.owner.cookie)).standards;
    const bad = {
      ...base,
      hardware: [{ id: 'b1', kind: 'buckle', name: '', insideWidthMm: 1, unitCostCents: -5 }],
      punches: [{ id: 'p1', diameterMm: 40, number: '#40' }],
      kinds: { ...base.kinds, collar: { ...base.kinds.collar!, easeMm: 900, stitchPitchMm: 0.2 } },
    };
    const res = await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send(bad).expect(400);
    const fields = res.body.error.fields as Record<string, string>;
    expect(fields['hardware.0.name']).toMatch(/Hardware name must not be empty/);
    expect(fields['hardware.0.insideWidthMm']).toMatch(/Inside width must be at least 3 mm/);
    expect(fields['hardware.0.unitCostCents']).toMatch(/Unit cost must be at least 0/);
    expect(fields['punches.0.diameterMm']).toMatch(/Punch diameter must be at most 25 mm/);
    expect(fields['kinds.collar.easeMm']).toMatch(/Ease must be at most 300 mm/);
    expect(fields['kinds.collar.stitchPitchMm']).toMatch(/Stitch pitch must be at least 1.5 mm/);
    for (const message of Object.values(fields)) {
      const text = message.replace(/^[\w.]+: /, ''); // the text after an optional "path: " lead-in
      expect(text).not.toMatch(/[a-z][A-Z]|\.\d+\./);
    }
  });

  it('when a kind points at hardware the list does not hold, then 400 names the buckle field', async () => {
    const base = (await read(w.owner.cookie)).standards;
    const bad = { ...base, kinds: { ...base.kinds, collar: { ...base.kinds.collar!, buckleId: 'gone' } } };
    const res = await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send(bad).expect(400);
    expect(res.body.error.fields['kinds.collar.buckleId']).toMatch(/Buckle must be a buckle from the shop/);
  });

  it('when a maker starts a new collar after the owner set the standard, then the spec carries the allowance, ease and buckle, lays out, and saves as revision 1', async () => {
    await request(t.app).put('/api/shop/standards').set('Cookie', w.owner.cookie).send(collarStandard((await read(w.owner.cookie)).standards)).expect(200);
    const start = await request(t.app).get('/api/shop/standards/start/collar').set('Cookie', w.maker.cookie).expect(200);
    expect(start.body.source).toBe('shop-standard');
    const spec = StrapSpecSchema.parse(start.body.spec);
    expect(spec.rule).toEqual({ measure: 'blank', allowanceMm: 190.5 });
    expect(spec.easeMm).toBe(12.7);
    expect(spec.hardware.buckle).toMatchObject({ insideWidthMm: 25.4, tongueLengthMm: 26, tongueWireMm: 3.5 });
    // Blank = girth + allowance (the shop's rule, common practice): 13 in + 7 1/2 in = 20 1/2 in.
    expect(computeLayout(spec).pieces[0]!.blankLengthMm).toBeCloseTo(520.7, 1);
    const created = await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name: 'Collar for Pepper', kind: 'collar', spec: { ...spec, name: 'Collar for Pepper' } }).expect(201);
    expect(created.body.head.spec.rule.allowanceMm).toBe(190.5);
  });

  it('when a kind was never set, then the new pattern is the built-in preset; an unknown kind is 404', async () => {
    const start = await request(t.app).get('/api/shop/standards/start/belt').set('Cookie', w.apprentice.cookie).expect(200);
    expect(start.body.spec).toEqual(presetSpec('belt'));
    await request(t.app).get('/api/shop/standards/start/saddle').set('Cookie', w.maker.cookie).expect(404);
  });
});
