// fast-check (property-based testing library) over the strap spec through the engine and the
// API: 300 random documents here, 10,000 in `npm run bench fuzz`. Replay with FUZZ_SEED=<seed>.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { buildWorld, type ShopWorld } from '../helpers/shop-world.ts';
import { seedFrom } from './seeded-random.ts';
import { checkEngine, runSpecFuzz } from './spec-fuzz.ts';
import { presetSpec } from '@shared/pattern/index.ts';

let t: TestApp;
let w: ShopWorld;
beforeAll(async () => {
  t = await createTestApp();
  w = await buildWorld(t);
});
afterAll(async () => {
  await t.close();
});

describe('spec fuzz', () => {
  it('when 300 random changes of the presets are laid out and saved, then nothing crashes or answers 500, and every refusal names a field in words', async () => {
    const seed = seedFrom('FUZZ_SEED');
    console.log(`spec fuzz seed ${seed} (replay with FUZZ_SEED=${seed})`);
    const tally = await runSpecFuzz(t, w, 300, seed);
    expect(tally.cases).toBe(300);
    // Both outcomes were exercised: the generator reaches valid and invalid specs.
    expect(tally.apiSaved).toBeGreaterThan(0);
    expect(tally.apiRefused).toBeGreaterThan(0);
  }, 600_000);

  it('when the checker meets a refusal worded with a schema path, then it fails (the checker can fail)', () => {
    // A spec whose girth is a word: the engine must refuse it in words; the checker accepts that...
    expect(checkEngine({ ...presetSpec('collar'), girthMm: 'thirteen' })).toBe(false);
    // ...and the same checker fails a crash that is not an EngineError.
    expect(() => checkEngine(new Proxy({}, { get: () => { throw new TypeError('boom'); } }))).toThrow(/engine crashed/);
  });
});
