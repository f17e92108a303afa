// Tip holes are numbered from 1 in the spec as on every table, drawing and PDF. Revisions and
// pattern files saved when the middle hole was counted from 0 (`nominalIndex`) keep working.
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/index.ts';
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

/** The collar preset as it was stored before holes were numbered from 1. */
function legacyCollar(): Record<string, unknown> {
  const s = JSON.parse(JSON.stringify(presetSpec('collar'))) as { pieces: { end: { holes: Record<string, unknown> } }[] };
  delete s.pieces[0]!.end.holes.middleHole;
  s.pieces[0]!.end.holes.nominalIndex = 2;
  return s as unknown as Record<string, unknown>;
}

const middleHoleOf = (spec: { pieces: { end: { holes: { middleHole?: number; nominalIndex?: number } } }[] }) => spec.pieces[0]!.end.holes;

describe('holes numbered from 1', () => {
  it('when a revision stored with the middle hole counted from 0 is read, then the API answers middle hole 3 and it still prints', async () => {
    const pid = w.collar.pattern.id;
    // Stored as an older version wrote it: straight into the table, as the next head.
    await t.db('revisions').insert({ pattern_id: pid, number: 2, spec: JSON.stringify(legacyCollar()), engine_version: '1.0.0', author_id: w.maker.id, note: 'old file', restored_from: null, created_at: Date.now() });
    await t.db('patterns').where({ id: pid }).update({ head_number: 2 });
    const res = await request(t.app).get(`/api/patterns/${pid}/revisions/2`).set('Cookie', w.maker.cookie).expect(200);
    expect(middleHoleOf(res.body.revision.spec)).toEqual(expect.objectContaining({ middleHole: 3 }));
    expect(middleHoleOf(res.body.revision.spec)).not.toHaveProperty('nominalIndex');
    await request(t.app).get(`/api/patterns/${pid}/revisions/2/svg`).set('Cookie', w.maker.cookie).expect(200);
  });

  it('when an old pattern file is imported, then its revision reads middle hole 3 of 5', async () => {
    const file = {
      format: 'latchet-pattern',
      formatVersion: 1,
      exportedAt: '2026-11-30T10:00:00.000Z',
      pattern: { name: "Bosun's collar", kind: 'collar', tags: [], archived: false },
      revisions: [{ number: 1, spec: legacyCollar(), engineVersion: '1.0.0', note: 'First cut', createdAt: '2026-11-30T10:00:00.000Z', author: 'Tobias Harrow', restoredFrom: null }],
    };
    const res = await request(t.app).post('/api/patterns/import').set('Cookie', w.maker.cookie).send(file).expect(201);
    expect(middleHoleOf(res.body.head.spec)).toEqual(expect.objectContaining({ middleHole: 3 }));
  });
});
