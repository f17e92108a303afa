// API benchmark (`npm run bench api`): our `GET /api/patterns/:id` and revision save over real
// HTTP on loopback, each as a ratio to a bare Express route in the same run doing the same
// better-sqlite3 select (for the read) or a bare durable insert (for the save: BEGIN IMMEDIATE,
// one row, synchronous=FULL, COMMIT). Then autocannon with 20 concurrent clients and a bounded
// number of requests: p50 and p99 of our read.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import autocannon from 'autocannon';
import Database from 'better-sqlite3';
import express from 'express';
import { createTestApp } from '../helpers/test-app.ts';
import { buildWorld, collarWithGirth } from '../helpers/shop-world.ts';
import { machineLine, verdict } from './measure.ts';

console.log(machineLine());

const TARGET = { read: 3, save: 5, p99OverP50: 5 };
const ROUNDS = 150;

const t = await createTestApp();
const w = await buildWorld(t);
const listen = (app: express.Express) =>
  new Promise<{ server: Server; url: string }>((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => resolve({ server, url: `http://127.0.0.1:${(server.address() as AddressInfo).port}` }));
  });

// The bare app: Express, JSON, one prepared statement each, on the same database file.
const raw = new Database(t.config.databaseFile);
raw.pragma('journal_mode = WAL');
raw.pragma('synchronous = FULL');
raw.pragma('busy_timeout = 5000');
raw.exec('create table if not exists bench_rows (id integer primary key, body text)');
const selectHead = raw.prepare('select p.*, r.number as head, r.spec, r.note, r.created_at as head_created_at from patterns p join revisions r on r.pattern_id = p.id and r.number = p.head_number where p.id = ? and p.shop_id = ?');
const insertRow = raw.prepare('insert into bench_rows (body) values (?)');
const durableInsert = raw.transaction((body: string) => insertRow.run(body));
const bare = express();
bare.use(express.json({ limit: '256kb' }));
bare.get('/bare/patterns/:id', (req, res) => {
  const row = selectHead.get(Number(req.params.id), w.shopId) as { spec: string } | undefined;
  if (!row) return void res.status(404).json({});
  res.json({ ...row, spec: JSON.parse(row.spec) as unknown });
});
bare.post('/bare/rows', (req, res) => {
  const r = durableInsert.immediate(JSON.stringify(req.body));
  res.status(201).json({ id: Number(r.lastInsertRowid) });
});

const ours = await listen(t.app);
const base = await listen(bare);
const id = w.collar.pattern.id;
const cookie = w.maker.cookie;

/**
 * Median and 99th percentile of sequential request times, ms, and CPU ms per request of this
 * process (client and server both live here; the client's share is the same for both routes).
 */
async function sequential(fn: () => Promise<Response>): Promise<{ p50: number; p99: number; cpu: number }> {
  for (let i = 0; i < 15; i++) await (await fn()).arrayBuffer();
  const ms: number[] = [];
  const c0 = process.cpuUsage();
  for (let i = 0; i < ROUNDS; i++) {
    const s = performance.now();
    const res = await fn();
    await res.arrayBuffer();
    if (res.status >= 300) throw new Error(`answered ${res.status}`);
    ms.push(performance.now() - s);
  }
  const c = process.cpuUsage(c0);
  ms.sort((a, b) => a - b);
  return { p50: ms[Math.floor(ms.length / 2)]!, p99: ms[Math.floor(ms.length * 0.99)]!, cpu: (c.user + c.system) / 1000 / ROUNDS };
}

const bareRead = await sequential(() => fetch(`${base.url}/bare/patterns/${id}`));
const ourRead = await sequential(() => fetch(`${ours.url}/api/patterns/${id}`, { headers: { cookie } }));
const body = JSON.stringify(collarWithGirth(330));
const bareSave = await sequential(() => fetch(`${base.url}/bare/rows`, { method: 'POST', headers: { 'content-type': 'application/json' }, body }));
let etag = w.collar.etag;
let girth = 300;
const ourSave = await sequential(async () => {
  girth = girth >= 600 ? 300 : girth + 1;
  const res = await fetch(`${ours.url}/api/patterns/${id}/revisions`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json', 'if-match': etag, origin: ours.url },
    body: JSON.stringify({ spec: collarWithGirth(girth), note: 'bench' }),
  });
  etag = res.headers.get('etag') ?? etag;
  return res;
});

// 20 concurrent clients, 2,000 requests in all, on each read route.
const load = async (url: string, headers: Record<string, string> = {}) => {
  const r = await autocannon({ url, connections: 20, amount: 2000, headers });
  return { p50: r.latency.p50, p99: r.latency.p99, rps: r.requests.average, non2xx: r.non2xx };
};
const bareLoad = await load(`${base.url}/bare/patterns/${id}`);
const ourLoad = await load(`${ours.url}/api/patterns/${id}`, { cookie });

const f = (v: number) => v.toFixed(2).padStart(8);
console.log('sequential over HTTP (loopback), ms            p50       p99   CPU/req   ratio p50 (target)   ratio CPU');
console.log(`bare route: same select (baseline)        ${f(bareRead.p50)}  ${f(bareRead.p99)}  ${f(bareRead.cpu)}`);
console.log(`GET /api/patterns/:id                     ${f(ourRead.p50)}  ${f(ourRead.p99)}  ${f(ourRead.cpu)}   ${(ourRead.p50 / bareRead.p50).toFixed(2)} (<= ${TARGET.read}) ${verdict(ourRead.p50 / bareRead.p50 <= TARGET.read)}   ${(ourRead.cpu / bareRead.cpu).toFixed(2)} ${verdict(ourRead.cpu / bareRead.cpu <= TARGET.read)}`);
console.log(`bare route: durable insert (baseline)     ${f(bareSave.p50)}  ${f(bareSave.p99)}  ${f(bareSave.cpu)}`);
console.log(`POST /api/patterns/:id/revisions          ${f(ourSave.p50)}  ${f(ourSave.p99)}  ${f(ourSave.cpu)}   ${(ourSave.p50 / bareSave.p50).toFixed(2)} (<= ${TARGET.save}) ${verdict(ourSave.p50 / bareSave.p50 <= TARGET.save)}   ${(ourSave.cpu / bareSave.cpu).toFixed(2)} ${verdict(ourSave.cpu / bareSave.cpu <= TARGET.save)}`);
console.log('\n20 concurrent clients, 2,000 requests (autocannon), ms   p50       p99   p99/p50 (target)   req/s   non-2xx');
console.log(`bare route: same select                 ${f(bareLoad.p50)}  ${f(bareLoad.p99)}   ${(bareLoad.p99 / Math.max(bareLoad.p50, 1)).toFixed(2).padStart(7)}            ${bareLoad.rps.toFixed(0).padStart(6)}   ${bareLoad.non2xx}`);
console.log(`GET /api/patterns/:id                   ${f(ourLoad.p50)}  ${f(ourLoad.p99)}   ${(ourLoad.p99 / Math.max(ourLoad.p50, 1)).toFixed(2).padStart(7)} (< ${TARGET.p99OverP50}) ${verdict(ourLoad.p99 / Math.max(ourLoad.p50, 1) < TARGET.p99OverP50)}   ${ourLoad.rps.toFixed(0).padStart(6)}   ${ourLoad.non2xx}`);
console.log('(autocannon reports whole milliseconds; a p50 under 1 ms counts as 1 in the p99/p50 ratio)');

ours.server.close();
base.server.close();
raw.close();
await t.close();
