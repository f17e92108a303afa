// Power-cut safety: the real server is SIGKILLed while four clients save revisions of two
// patterns; SQLite in WAL mode with synchronous=FULL must keep every save it acknowledged
// (SQLite docs, "Atomic Commit" and "WAL": a committed transaction survives a crash) and the
// file must stay whole. 3 cycles here; `npm run bench crash` runs 200.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCrashCycles } from './crash-cycles.ts';
import { seedFrom } from './seeded-random.ts';

describe('crash', () => {
  it('when the server is killed mid-save 3 times, then the file passes integrity_check and every acknowledged revision is there, numbered without gaps', async () => {
    const seed = seedFrom('CRASH_SEED');
    const dir = mkdtempSync(join(tmpdir(), 'latchet-crash-'));
    // The seed is in the test output so a failure can be replayed with CRASH_SEED=<seed>.
    console.log(`crash test seed ${seed} (replay with CRASH_SEED=${seed})`);
    try {
      const report = await runCrashCycles({ cycles: 3, seed, dir });
      expect(report.cycles).toBe(3);
      // Each cycle waits for at least one 201 before the kill, so something was at stake.
      expect(report.acknowledged).toBeGreaterThanOrEqual(3);
      expect(report.revisionsOnDisk).toBeGreaterThanOrEqual(report.acknowledged + 2);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
    // Each cycle starts a server process (seconds on a busy machine): a hang guard, not a speed limit.
  }, 600_000);
});
