// `npm run bench fuzz`: 10,000 fast-check cases of the strap spec through the engine and the
// API's save (tests/faults/spec-fuzz.ts; `npm test` runs 300). Not a speed figure: it fails
// (exit 1) on any crash, 500, or refusal without a field or worded with a schema path, and
// prints the seed (replay with FUZZ_SEED=<seed>; FUZZ_CASES=<n> for a shorter run).
import { createTestApp } from '../helpers/test-app.ts';
import { buildWorld } from '../helpers/shop-world.ts';
import { seedFrom } from '../faults/seeded-random.ts';
import { runSpecFuzz } from '../faults/spec-fuzz.ts';

const cases = Number(process.env.FUZZ_CASES ?? 10_000);
const seed = seedFrom('FUZZ_SEED');
console.log(`fuzz: ${cases} cases, seed ${seed} (replay with FUZZ_SEED=${seed})`);
const t = await createTestApp();
const started = process.hrtime.bigint();
try {
  const tally = await runSpecFuzz(t, await buildWorld(t), cases, seed);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  console.table([
    { check: 'cases (engine + API save each)', value: tally.cases },
    { check: 'accepted by the engine', value: tally.engineAccepted },
    { check: 'saved by the API (201)', value: tally.apiSaved },
    { check: 'refused (400, fields named in words)', value: tally.apiRefused },
    { check: 'crashes / 500s', value: 0 },
    { check: 'seed', value: seed },
    { check: 'wall time, s', value: Math.round(seconds) },
  ]);
} catch (err) {
  console.error(`fuzz bench FAILED (seed ${seed}):`, err);
  process.exitCode = 1;
} finally {
  await t.close();
}
