// `npm run bench`: runs every tests/bench/*.bench.ts in its own process, one after another,
// so one benchmark's heap and JIT state never colours the next. Each file prints its own
// table of ratios against a baseline it measures in the same run.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const dir = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv[2];
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only)))
  .sort();
let failed = 0;
for (const f of files) {
  console.log(`\n== ${f}`);
  const r = spawnSync(process.execPath, ['--import', 'tsx', '--expose-gc', `${dir}${f}`], { stdio: 'inherit' });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
