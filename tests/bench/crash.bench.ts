// `npm run bench crash`: 200 kill-and-restart cycles of the real server while four clients save
// (tests/faults/crash-cycles.ts; `npm test` runs 3). Not a speed figure: it fails (exit 1) on
// any lost acknowledged save, numbering gap or integrity_check problem, and prints the seed
// (replay with CRASH_SEED=<seed>; CRASH_CYCLES=<n> for a shorter run).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCrashCycles } from '../faults/crash-cycles.ts';
import { seedFrom } from '../faults/seeded-random.ts';

const cycles = Number(process.env.CRASH_CYCLES ?? 200);
const seed = seedFrom('CRASH_SEED');
const dir = mkdtempSync(join(tmpdir(), 'latchet-crash-bench-'));
console.log(`crash: ${cycles} cycles, seed ${seed} (replay with CRASH_SEED=${seed})`);
const started = process.hrtime.bigint();
try {
  const report = await runCrashCycles({ cycles, seed, dir, log: (line) => console.log(line) });
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  console.table([
    { check: 'cycles (SIGKILL + restart)', value: report.cycles },
    { check: 'saves acknowledged (201), all found after the kills', value: report.acknowledged },
    { check: 'saves cut off by a kill (no answer)', value: report.cutOff },
    { check: '... of which committed anyway', value: report.cutOffButSaved },
    { check: '412 stale (two clients, one pattern)', value: report.stale },
    { check: 'revisions on disk, numbered without gaps', value: report.revisionsOnDisk },
    { check: 'integrity_check', value: 'ok after every kill' },
    { check: 'seed', value: seed },
    { check: 'wall time, s', value: Math.round(seconds) },
  ]);
} catch (err) {
  console.error(`crash bench FAILED (seed ${seed}):`, err);
  process.exitCode = 1;
} finally {
  rmSync(dir, { recursive: true, force: true });
}
