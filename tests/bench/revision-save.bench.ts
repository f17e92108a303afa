// What a saved revision costs over HTTP, as ratios against a bare durable write measured in
// the same run: one row inserted in a BEGIN IMMEDIATE transaction with synchronous=FULL.
import request from 'supertest';
import { writeTransaction } from '../../server/db/write-transaction.ts';
import { createTestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth } from '../helpers/shop-world.ts';

const ROUNDS = 40;
const t = await createTestApp();
const w = await buildWorld(t);

async function timeMs(fn: () => Promise<unknown>, rounds: number): Promise<number> {
  const start = process.hrtime.bigint();
  for (let i = 0; i < rounds; i += 1) await fn();
  return Number(process.hrtime.bigint() - start) / 1e6 / rounds;
}

await t.db.schema.createTable('bench_rows', (tb) => {
  tb.increments('id');
  tb.text('body');
});
const body = JSON.stringify(collarWithGirth(330));
const baseline = await timeMs(() => writeTransaction(t.db, (trx) => trx('bench_rows').insert({ body })), ROUNDS);

let etag = w.collar.etag;
let girth = 300;
const save = await timeMs(async () => {
  girth += 1;
  const res = await request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', etag).send({ spec: collarWithGirth(girth), note: 'bench' });
  if (res.status !== 201) throw new Error(`save answered ${res.status}`);
  etag = String(res.headers.etag);
}, ROUNDS);

const read = await timeMs(() => request(t.app).get(`/api/patterns/${w.collar.pattern.id}`).set('Cookie', w.maker.cookie).expect(200), ROUNDS);

const raceStart = process.hrtime.bigint();
const results = await Promise.all(Array.from({ length: 20 }, (_, i) => request(t.app).post(`/api/patterns/${w.collar.pattern.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', etag).send({ spec: collarWithGirth(500 + i) })));
const race = Number(process.hrtime.bigint() - raceStart) / 1e6;
const won = results.filter((r) => r.status === 201).length;

console.table([
  { case: 'baseline: 1 row, BEGIN IMMEDIATE, synchronous=FULL', msPerOp: baseline.toFixed(2), ratio: '1.00' },
  { case: 'POST /revisions (validate, layout, compare-and-set, audit, mail queue)', msPerOp: save.toFixed(2), ratio: (save / baseline).toFixed(2) },
  { case: 'GET /patterns/:id (pattern + head)', msPerOp: read.toFixed(2), ratio: (read / baseline).toFixed(2) },
  { case: `20 racing saves on one base (${won} won)`, msPerOp: race.toFixed(2), ratio: (race / baseline).toFixed(2) },
]);
await t.close();
