// The crash check shared by `npm test` (a few cycles) and `npm run bench crash` (200): clients
// save revisions to the real server while it is SIGKILLed at a random moment; after each kill
// the file must pass PRAGMA integrity_check, hold every revision whose 201 reached a client
// (same number, same note), number each pattern's revisions 1..head without gaps, and the
// restarted server must serve that head.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { presetSpec } from '../../shared/pattern/presets/index.ts';
import { migrateLatest, openDb } from '../../server/db/connection.ts';
import { seededRandom } from './seeded-random.ts';
import { startServerProcess, type ServerProcess } from './server-process.ts';

export interface CrashOptions {
  /** Kill-and-restart cycles. */
  cycles: number;
  /** Seed of every random choice (printed, so a failure can be replayed). */
  seed: number;
  /** A fresh folder for the database. */
  dir: string;
  /** Clients saving at once (default 4) over `patterns` patterns (default 2: they contend). */
  clients?: number;
  patterns?: number;
  /** The kill comes this long at most after the cycle's first acknowledged save, ms. */
  maxKillDelayMs?: number;
  log?: (line: string) => void;
}

export interface CrashReport {
  seed: number;
  cycles: number;
  /** Saves answered 201 (all found again after the kills). */
  acknowledged: number;
  /** Saves cut off by a kill (no answer): present or absent, both are allowed. */
  cutOff: number;
  /** Of the cut-off saves, how many had committed anyway (found on disk). */
  cutOffButSaved: number;
  /** 412 answers (two clients on one pattern), each followed by a re-read. */
  stale: number;
  revisionsOnDisk: number;
}

interface Ack {
  patternId: number;
  number: number;
  note: string;
}

const json = { 'content-type': 'application/json' };

async function signUp(url: string): Promise<string> {
  const body = { email: 'crash@harrowfinch.example', password: 'oak-bark-tannage-7', name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks' };
  const res = await fetch(`${url}/api/auth/sign-up`, { method: 'POST', headers: json, body: JSON.stringify(body) });
  if (res.status !== 201) throw new Error(`sign-up: ${res.status} ${await res.text()}`);
  return res.headers.getSetCookie().find((c) => c.startsWith('latchet_session='))!.split(';')[0]!;
}

/** Checks the file directly (as the restarted server will open it); returns revisions per pattern. */
function checkFile(file: string, acks: Ack[], patternIds: number[]): Map<number, Map<number, string>> {
  const db = new Database(file);
  try {
    const integrity = db.pragma('integrity_check', { simple: true });
    if (integrity !== 'ok') throw new Error(`integrity_check: ${String(integrity)}`);
    const found = new Map<number, Map<number, string>>();
    for (const id of patternIds) {
      const rows = db.prepare('SELECT number, note FROM revisions WHERE pattern_id = ? ORDER BY number').all(id) as { number: number; note: string }[];
      rows.forEach((r, i) => {
        if (r.number !== i + 1) throw new Error(`pattern ${id}: revision numbers ${rows.map((x) => x.number).join(',')} have a gap at ${i + 1}`);
      });
      const head = (db.prepare('SELECT head_number FROM patterns WHERE id = ?').get(id) as { head_number: number }).head_number;
      if (head !== rows.length) throw new Error(`pattern ${id}: head_number ${head} but ${rows.length} revisions`);
      found.set(id, new Map(rows.map((r) => [r.number, r.note])));
    }
    for (const a of acks) {
      const note = found.get(a.patternId)?.get(a.number);
      if (note !== a.note) throw new Error(`acknowledged revision ${a.number} of pattern ${a.patternId} ("${a.note}") is ${note === undefined ? 'missing' : `"${note}"`}`);
    }
    return found;
  } finally {
    db.close();
  }
}

export async function runCrashCycles(o: CrashOptions): Promise<CrashReport> {
  const clients = o.clients ?? 4;
  const patterns = o.patterns ?? 2;
  const maxKillDelayMs = o.maxKillDelayMs ?? 150;
  const random = seededRandom(o.seed);
  const log = o.log ?? (() => undefined);
  mkdirSync(o.dir, { recursive: true });
  const file = join(o.dir, 'crash.sqlite3');
  const setup = openDb(file);
  await migrateLatest(setup);
  await setup.destroy();

  let server: ServerProcess = await startServerProcess(file);
  const report: CrashReport = { seed: o.seed, cycles: 0, acknowledged: 0, cutOff: 0, cutOffButSaved: 0, stale: 0, revisionsOnDisk: 0 };
  const acks: Ack[] = [];
  try {
    const cookie = await signUp(server.url);
    const base = presetSpec('collar');
    const patternIds: number[] = [];
    for (let p = 0; p < patterns; p++) {
      const res = await fetch(`${server.url}/api/patterns`, { method: 'POST', headers: { ...json, cookie }, body: JSON.stringify({ name: `Crash collar ${p + 1}`, kind: 'collar', spec: base }) });
      if (res.status !== 201) throw new Error(`create pattern: ${res.status} ${await res.text()}`);
      const body = (await res.json()) as { pattern: { id: number }; head: { number: number } };
      patternIds.push(body.pattern.id);
      acks.push({ patternId: body.pattern.id, number: 1, note: '' });
    }
    let seq = 0;

    for (let cycle = 1; cycle <= o.cycles; cycle++) {
      const url = server.url;
      let dead = false;
      let firstAck: () => void = () => undefined;
      const acked = new Promise<void>((resolve) => (firstAck = resolve));
      const cutOff: Ack[] = [];

      const client = async (c: number) => {
        const patternId = patternIds[c % patterns]!;
        let etag: string | null = null;
        while (!dead) {
          try {
            if (etag === null) {
              const got = await fetch(`${url}/api/patterns/${patternId}`, { headers: { cookie } });
              if (got.status !== 200) throw new Error(`read pattern: ${got.status} ${await got.text()}`);
              etag = got.headers.get('etag');
              await got.arrayBuffer();
            }
            const note = `cycle ${cycle} client ${c} save ${++seq}`;
            // The girth moves a little with every save, so each revision's spec differs.
            const spec = { ...base, name: note, girthMm: 300 + (seq % 100) };
            let res: Response;
            try {
              res = await fetch(`${url}/api/patterns/${patternId}/revisions`, { method: 'POST', headers: { ...json, cookie, 'if-match': etag! }, body: JSON.stringify({ spec, note }) });
            } catch (err) {
              // No answer: the kill came while the save was in flight; it may or may not be on disk.
              cutOff.push({ patternId, number: -1, note });
              throw err;
            }
            if (res.status === 201) {
              const body = (await res.json()) as { revision: { number: number } };
              acks.push({ patternId, number: body.revision.number, note });
              report.acknowledged++;
              etag = res.headers.get('etag');
              firstAck();
            } else if (res.status === 412) {
              report.stale++;
              etag = res.headers.get('etag');
              await res.arrayBuffer();
            } else throw new Error(`save: ${res.status} ${await res.text()}`);
          } catch (err) {
            if (dead || /fetch failed|ECONNRESET|ECONNREFUSED|socket/i.test(String((err as Error).cause ?? err))) return;
            throw err;
          }
        }
      };

      const running = Promise.all(Array.from({ length: clients }, (_, c) => client(c)));
      // The kill comes at a random moment after this cycle's first acknowledged save, so every
      // cycle has something to lose however slow the machine is.
      const delayMs = Math.floor(random() * maxKillDelayMs);
      await Promise.race([acked, running.then(() => undefined)]);
      await new Promise((r) => setTimeout(r, delayMs));
      await server.kill();
      dead = true;
      await running;

      const found = checkFile(file, acks, patternIds);
      report.cutOff += cutOff.length;
      report.cutOffButSaved += cutOff.filter((x) => [...(found.get(x.patternId)?.values() ?? [])].includes(x.note)).length;
      report.revisionsOnDisk = [...found.values()].reduce((n, m) => n + m.size, 0);
      report.cycles = cycle;

      server = await startServerProcess(file);
      for (const id of patternIds) {
        const res = await fetch(`${server.url}/api/patterns/${id}`, { headers: { cookie } });
        const body = (await res.json()) as { head: { number: number } };
        if (res.status !== 200 || body.head.number !== found.get(id)!.size) throw new Error(`after restart, pattern ${id} answers ${res.status} head ${body.head?.number}, file has ${found.get(id)!.size}`);
      }
      log(`cycle ${cycle}: killed ${delayMs} ms after the first 201; ${report.acknowledged} acknowledged so far, ${cutOff.length} cut off; integrity ok, ${report.revisionsOnDisk} revisions without gaps`);
    }
    return report;
  } finally {
    await server.stop();
  }
}
