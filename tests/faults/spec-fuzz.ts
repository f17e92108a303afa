// fast-check over the strap spec: presets with a few random changes anywhere in the document
// (numbers scaled or replaced, other choices, wrong types, deleted keys, emptied lists). Each
// case goes through the engine (schema, layout of every size, drawing, size run) and through
// the API's save. Nothing may crash or answer 500; every refusal names a field and reads as
// words, not as a schema path. Shared by `npm test` (a few hundred) and `npm run bench fuzz`.
import fc from 'fast-check';
import request from 'supertest';
import { computeLayout, drawLayout, EngineError, gradeSizes, parseSpec, presetSpec, PRESET_NAMES, specAtGirth } from '@shared/pattern/index.ts';
import type { StrapSpec } from '@shared/schemas/strap-spec.ts';
import type { TestApp } from '../helpers/test-app.ts';
import type { ShopWorld } from '../helpers/shop-world.ts';
import { inhumanPart } from './human-text.ts';

type Seg = string | number;
const DELETE = Symbol('delete');
const SCALE = Symbol('scale');
type Change = { at: number; value: unknown } | { at: number; value: typeof SCALE; factor: number };

/** Words the schema knows in some field: a random one lands in the wrong field often. */
const CHOICES = ['in', 'mm', 'oz', 'rule', 'fit', 'blank', 'nominal-hole', 'fixed', 'girth', 'keeper', 'strap', 'bridge', 'accessory', 'square', 'round', 'clipped', 'english-point', 'spear', 'fold-over', 'adjustable', 'plain', 'fold-back', 'both-edges', 'top-edge', 'around-end', 'start', 'end', 'rivet', 'hole', 'centre-bar', 'collar', 'belt'];

const valueArb: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 0, max: 3, noNaN: true }).map((factor) => ({ scale: factor })) },
  { weight: 2, arbitrary: fc.double({ min: -1e7, max: 1e7, noNaN: true, noDefaultInfinity: true }) },
  { weight: 2, arbitrary: fc.integer({ min: -3, max: 40 }) },
  { weight: 2, arbitrary: fc.constantFrom(...CHOICES) },
  { weight: 1, arbitrary: fc.string({ maxLength: 10 }) },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(true, false, null, DELETE, [], {}) },
);

const changeArb: fc.Arbitrary<Change> = fc.record({ at: fc.nat(), value: valueArb }).map(({ at, value }) =>
  value !== null && typeof value === 'object' && 'scale' in value ? { at, value: SCALE, factor: (value as { scale: number }).scale } : { at, value },
);

/** A starting spec: a preset in either unit, sometimes with a three-size run. */
const baseArb = fc.record({ kind: fc.constantFrom(...PRESET_NAMES), units: fc.constantFrom('in', 'mm'), sized: fc.boolean() }).map(({ kind, units, sized }) => {
  const s: StrapSpec = { ...presetSpec(kind), units: units as 'in' | 'mm' };
  if (sized) s.sizes = [-25.4, 0, 25.4].map((d, i) => ({ name: ['S', 'M', 'L'][i]!, girthMm: s.girthMm + d }));
  return s;
});

/** Every node of the document but the root, with its path. */
function paths(v: unknown, at: Seg[] = []): Seg[][] {
  const here = at.length ? [at] : [];
  if (Array.isArray(v)) return [...here, ...v.flatMap((x, i) => paths(x, [...at, i]))];
  if (v !== null && typeof v === 'object') return [...here, ...Object.entries(v).flatMap(([k, x]) => paths(x, [...at, k]))];
  return here;
}

function apply(spec: unknown, change: Change): unknown {
  const all = paths(spec);
  if (all.length === 0) return spec;
  const path = all[change.at % all.length]!;
  const copy = structuredClone(spec) as Record<Seg, unknown>;
  let node = copy;
  for (const k of path.slice(0, -1)) node = node[k] as Record<Seg, unknown>;
  const key = path.at(-1)!;
  if (change.value === DELETE) {
    if (Array.isArray(node)) node.splice(Number(key), 1);
    else delete node[key];
  } else if (change.value === SCALE) {
    if (typeof node[key] === 'number') node[key] = Math.round((node[key] as number) * (change as { factor: number }).factor * 1000) / 1000;
  } else node[key] = change.value;
  return copy;
}

/** A fuzz case: the spec as JSON would carry it (what the API and the engine both receive). */
export const specCaseArb: fc.Arbitrary<unknown> = fc
  .tuple(baseArb, fc.array(changeArb, { minLength: 1, maxLength: 4 }))
  .map(([base, changes]) => JSON.parse(JSON.stringify(changes.reduce<unknown>(apply, base))) as unknown);

/** A refusal that a person would read: the field and the words. */
function expectHumanRefusal(where: string, field: string, message: string): void {
  if (!field) throw new Error(`${where}: refusal names no field: "${message}"`);
  const bad = inhumanPart(message);
  if (bad) throw new Error(`${where}: the message for ${field} shows ${bad}: "${message}"`);
}

/** Through the engine as the editor and the server run it; true when the spec was accepted. */
export function checkEngine(input: unknown): boolean {
  try {
    const spec = parseSpec(input);
    const layout = computeLayout(spec);
    drawLayout(layout, spec, { revision: 'rev 1', date: '2026-12-03' });
    for (const size of spec.sizes) computeLayout(specAtGirth(spec, { sizeName: size.name }));
    if (spec.sizes.length > 0) gradeSizes(spec, spec.sizes);
    return true;
  } catch (err) {
    if (!(err instanceof EngineError)) throw new Error(`engine crashed (${(err as Error).name}: ${(err as Error).message}) on ${printable(input)}`, { cause: err });
    expectHumanRefusal('engine', err.field, err.message);
    return false;
  }
}

/** One pattern per preset kind, where the fuzz saves its revisions (a save must keep the kind). */
export interface FuzzPatterns {
  byKind: Map<string, { id: number; etag: string }>;
}

/** Creates a pattern of every preset kind for the maker of `w`. */
export async function fuzzPatterns(t: TestApp, w: ShopWorld): Promise<FuzzPatterns> {
  const byKind = new Map<string, { id: number; etag: string }>();
  for (const kind of PRESET_NAMES) {
    const res = await request(t.app).post('/api/patterns').set('Cookie', w.maker.cookie).send({ name: `Fuzz ${kind}`, kind, spec: presetSpec(kind) });
    if (res.status !== 201) throw new Error(`create ${kind}: ${res.status} ${JSON.stringify(res.body)}`);
    byKind.set(kind, { id: res.body.pattern.id as number, etag: res.headers.etag as string });
  }
  return { byKind };
}

const printable = (v: unknown) => {
  try {
    return JSON.stringify(v);
  } catch {
    return '(unprintable)';
  }
};

/**
 * A save through the API as a maker, on the pattern of the spec's kind (the collar's when the
 * kind is not one of ours); returns the status (201 or 400; anything else throws).
 */
export async function checkApi(t: TestApp, w: ShopWorld, patterns: FuzzPatterns, input: unknown): Promise<number> {
  const kind = (input as { kind?: unknown } | null)?.kind;
  const target = patterns.byKind.get(typeof kind === 'string' ? kind : '') ?? patterns.byKind.get('collar')!;
  const res = await request(t.app).post(`/api/patterns/${target.id}/revisions`).set('Cookie', w.maker.cookie).set('If-Match', target.etag).send({ spec: input, note: 'fuzz' });
  if (t.errors.length > 0) throw new Error(`the app logged an unexpected error: ${String(t.errors[0])}`);
  if (res.status === 201) {
    target.etag = res.headers.etag as string;
    return 201;
  }
  if (res.status !== 400) throw new Error(`save answered ${res.status} ${printable(res.body)} for ${printable(input)}`);
  const { message, fields } = res.body.error as { message: string; fields?: Record<string, string> };
  const entries = Object.entries(fields ?? {});
  if (entries.length === 0) throw new Error(`400 without fields: ${message}`);
  for (const [path, text] of entries) expectHumanRefusal('api', path, text);
  expectHumanRefusal('api message', entries[0]![0], message);
  return 400;
}

export interface FuzzTally {
  cases: number;
  engineAccepted: number;
  apiSaved: number;
  apiRefused: number;
}

/** Runs `numRuns` cases with `seed` through both doors; throws fast-check's report (with the seed) on the first failure. */
export async function runSpecFuzz(t: TestApp, w: ShopWorld, numRuns: number, seed: number): Promise<FuzzTally> {
  const tally: FuzzTally = { cases: 0, engineAccepted: 0, apiSaved: 0, apiRefused: 0 };
  const patterns = await fuzzPatterns(t, w);
  await fc.assert(
    fc.asyncProperty(specCaseArb, async (input) => {
      tally.cases++;
      const engineOk = checkEngine(input);
      if (engineOk) tally.engineAccepted++;
      const status = await checkApi(t, w, patterns, input);
      if (status === 201) tally.apiSaved++;
      else tally.apiRefused++;
      // The server runs the same engine: what it saves, the engine accepts, and what the engine
      // accepts, it saves (unless the kind was changed, which a save refuses by rule).
      const kindKept = patterns.byKind.has(String((input as { kind?: unknown }).kind));
      if (status === 201 && !engineOk) throw new Error(`the API saved what the engine refuses: ${printable(input)}`);
      if (engineOk && kindKept && status !== 201) throw new Error(`the engine accepts but the API answered ${status}: ${printable(input)}`);
    }),
    { numRuns, seed, endOnFailure: true },
  );
  return tally;
}
