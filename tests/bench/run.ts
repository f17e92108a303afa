// `npm run bench`: runs every tests/bench/*.bench.ts in its own process, one after another,
// so one benchmark's heap and JIT state never colours the next. Each file prints its own
// table of ratios against a baseline it measures in the same run. BENCH_PROFILE=1 adds
// node --cpu-prof (profiles in test-output/bench/profiles; read them with top-functions.ts).
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const dir = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv[2];
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only)))
  .sort();
const profile = process.env.BENCH_PROFILE === '1' ? ['--cpu-prof', '--cpu-prof-dir=test-output/bench/profiles'] : [];
let failed = 0;
for (const f of files) {
  console.log(`\n== ${f}`);
  const r = spawnSync(process.execPath, ['--import', 'tsx', '--expose-gc', ...profile, `${dir}${f}`], { stdio: 'inherit' });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
