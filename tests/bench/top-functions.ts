// `node --import tsx tests/bench/top-functions.ts DIR [N]`: the N functions with the most self
// time in the newest .cpuprofile in DIR (written by `BENCH_PROFILE=1 npm run bench ...`), as a
// share of all samples. Profile first, then fix what dominates.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

const dir = process.argv[2] ?? 'test-output/bench/profiles';
const top = Number(process.argv[3] ?? 25);
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.cpuprofile'))
  .map((f) => join(dir, f))
  .sort((a, b) => statSync(b).mtimeMs - statSync(a).mtimeMs);
if (!files[0]) throw new Error(`no .cpuprofile in ${dir}`);
const p = JSON.parse(readFileSync(files[0], 'utf8')) as Profile;
const selfUs = new Map<number, number>();
p.samples.forEach((id, i) => selfUs.set(id, (selfUs.get(id) ?? 0) + (p.timeDeltas[i] ?? 0)));
const byName = new Map<string, number>();
let total = 0;
for (const n of p.nodes) {
  const t = selfUs.get(n.id) ?? 0;
  total += t;
  const where = n.callFrame.url.replace(/^.*node_modules\//, '').replace(/^file:\/\/.*?\/(shared|server|src|tests)\//, '$1/');
  const key = `${n.callFrame.functionName || "(anonymous)"}  ${where}:${n.callFrame.lineNumber + 1}`;
  byName.set(key, (byName.get(key) ?? 0) + t);
}
console.log(`${files[0]}: ${(total / 1000).toFixed(0)} ms sampled`);
for (const [k, t] of [...byName].sort((a, b) => b[1] - a[1]).slice(0, top)) console.log(`${((t / total) * 100).toFixed(1).padStart(5)} %  ${k}`);
