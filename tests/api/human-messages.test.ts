// Every refusal of a strap spec a person can read - from the schema, the engine, the API and
// the editor's resolver - names the field by its label in the form's unit: never a schema path
// (`pieces.0.end.holes.count`), a camelCase key (`girthMm`) or the engine's own name. The bad
// inputs are generated from the spec's limits (strap-spec-limits.ts) at every field of every
// preset, so a new field without a label fails here.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { computeLayout, EngineError, parseSpec, presetSpec, PRESET_NAMES, specAtGirth } from '@shared/pattern/index.ts';
import * as LIMITS from '@shared/schemas/strap-spec-limits.ts';
import { StrapSpecSchema, type StrapSpec, type StrapSpecInput } from '@shared/schemas/strap-spec.ts';
import { specIssueMessages } from '@shared/schemas/spec-messages.ts';
import { specResolver } from '@/lib/spec-resolver.ts';
import { createTestApp, type TestApp } from '../helpers/test-app.ts';
import { signUpBody, sessionCookieOf } from '../helpers/accounts.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)

/** What must never reach a person: a dotted path, a camelCase word, a unit-suffixed key, the engine. */
function inhuman(message: string): string | null {
  if (/\b[A-Za-z_]\w+\.(\d+|[A-Za-z_]\w+)\b/.test(message)) return 'a schema path';
  if (/\b[a-z]+[A-Z][A-Za-z]*\b/.test(message)) return 'a camelCase name';
  if (/\bengine\b|\bcannot draw\b|\bnominal\b|\bdatum\b/i.test(message)) return 'our own jargon';
  if (/Invalid input|expected [a-z]+, received/.test(message)) return "zod's default wording";
  return null;
}

const expectHuman = (message: string, where: string) => expect(inhuman(message), `${where}: "${message}"`).toBeNull();

/** A preset with a graded size run, so the per-size fields are walked too. */
function withSizes(kind: (typeof PRESET_NAMES)[number]): StrapSpec {
  const s = presetSpec(kind);
  return { ...s, sizes: [{ name: 'S', girthMm: s.girthMm, widthMm: s.widthMm, holes: { count: 3, spacingMm: 15 }, hardware: { buckleInsideWidthMm: s.widthMm, dRingInsideWidthMm: s.widthMm } }] };
}

type Path = (string | number)[];
/** Every leaf (number, string, boolean) of a value, with its path. */
function leaves(v: unknown, path: Path = []): { path: Path; value: unknown }[] {
  if (Array.isArray(v)) return v.flatMap((x, i) => leaves(x, [...path, i]));
  if (v !== null && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => leaves(x, [...path, k]));
  return [{ path, value: v }];
}

function setAt(spec: unknown, path: Path, value: unknown): unknown {
  const copy = structuredClone(spec) as Record<string | number, unknown>;
  let node = copy;
  for (const k of path.slice(0, -1)) node = node[k] as Record<string | number, unknown>;
  if (value === undefined) delete node[path.at(-1)!];
  else node[path.at(-1)!] = value;
  return copy;
}

// Just past every limit the schema knows (in its own unit), plus values of the wrong kind.
const limitValues = [...new Set((Object.values(LIMITS) as unknown[]).filter((x): x is number => typeof x === 'number'))];
const wrongNumbers = [-1e6, 1e6, 0, 1.5, 'thirteen', null, undefined];
/** Limits of the same order as the field's value (a 330 mm girth meets 50 and 3000, not 0.3): just past each. */
const numberProbes = (v: number) => [...limitValues.filter((x) => Math.abs(x) <= Math.max(20, 10 * Math.abs(v)) && Math.abs(x) >= Math.abs(v) / 10).flatMap((x) => [x - 0.01, x + 0.01]), ...wrongNumbers];
const stringProbes = ['', 'x'.repeat(LIMITS.NAME_MAX_CHARS + 1), 'no-such-choice', 7, undefined];
const boolProbes = ['yes', undefined];

function probesOf(value: unknown, near = true): unknown[] {
  if (typeof value === 'number') return near ? numberProbes(value) : wrongNumbers;
  if (typeof value === 'string') return stringProbes;
  return boolProbes;
}

/** Every bad spec derived from the presets: one field at a time, each probe, in inches and in mm. */
function* badSpecs(): Generator<{ where: string; input: unknown }> {
  // Each field path gets the limit probes once (the first preset that has it), to bound the work.
  const probed = new Set<string>();
  for (const kind of PRESET_NAMES)
    for (const units of ['in', 'mm'] as const) {
      const base = { ...withSizes(kind), units };
      // Just past every limit in the inch pass; the mm pass tries the wrong kinds and extremes.
      for (const { path, value } of leaves(base)) {
        const key = path.join('.');
        const near = units === 'in' && !probed.has(key);
        probed.add(key);
        for (const probe of probesOf(value, near)) yield { where: `${kind}/${units} ${path.join('.')}=${String(probe)}`, input: setAt(base, path, probe) };
      }
      yield { where: `${kind}/${units} no pieces`, input: { ...base, pieces: [] } };
      yield { where: `${kind}/${units} too many sizes`, input: { ...base, sizes: Array.from({ length: LIMITS.SIZES_MAX + 1 }, (_, i) => ({ name: `S${i}`, girthMm: 300 })) } };
      yield { where: `${kind}/${units} twin sizes`, input: { ...base, sizes: [{ name: 'M', girthMm: 300 }, { name: 'm', girthMm: 320 }] } };
    }
}

describe('spec messages in the engine and the schema', () => {
  it('when any field of any preset is pushed past its limits, then every schema and engine message names the field by its label in the display unit', () => {
    let schemaMessages = 0;
    let engineMessages = 0;
    for (const { where, input } of badSpecs()) {
      const r = StrapSpecSchema.safeParse(input);
      if (!r.success) {
        for (const m of specIssueMessages(r.error, input)) expectHuman(m.message, `${where} schema`);
        try {
          parseSpec(input);
        } catch (e) {
          expectHuman((e as Error).message, `${where} parseSpec`);
        }
        schemaMessages++;
        continue;
      }
      // The run's sizes are laid out when the probe is in the run (the save and print do so too).
      const sizes = where.includes(' sizes.') ? r.data.sizes.map((z) => specAtGirth(r.data, { sizeName: z.name })) : [];
      for (const at of [r.data, ...sizes])
        try {
          computeLayout(at);
        } catch (e) {
          if (!(e instanceof EngineError)) throw e;
          expectHuman(e.message, `${where} engine`);
          engineMessages++;
        }
    }
    // The walk must really reach both kinds of refusal, or it proves nothing.
    expect(schemaMessages).toBeGreaterThan(500);
    expect(engineMessages).toBeGreaterThan(20);
    // Thousands of specs: minutes on a loaded 2-core machine. The bound only guards against a hang.
  }, 600_000);

  it('when the girth is too small, then the message is the label and the limit in the unit the form shows', () => {
    const at = (units: 'in' | 'mm') => specIssueMessages(StrapSpecSchema.safeParse({ ...presetSpec('collar'), units, girthMm: 10 }).error!, { units });
    expect(at('in')).toEqual([{ path: 'girthMm', message: 'Girth must be at least 1 31/32 in' }]);
    expect(at('mm')).toEqual([{ path: 'girthMm', message: 'Girth must be at least 50 mm' }]);
  });
});

describe('spec messages in the editor form (the same schema through its resolver)', () => {
  it('when any field of the collar is pushed past its limits, then every error the form shows is human', async () => {
    let shown = 0;
    for (const units of ['in', 'mm'] as const) {
      const base = { ...withSizes('collar'), units };
      for (const { path, value } of leaves(base))
        for (const probe of probesOf(value)) {
          const values = setAt(base, path, probe) as StrapSpecInput;
          const r = await specResolver(values, undefined, { fields: {}, shouldUseNativeValidation: false });
          for (const { value: message } of leaves(r.errors).filter((l) => l.path.at(-1) === 'message')) {
            expectHuman(String(message), `form ${units} ${path.join('.')}=${String(probe)}`);
            shown++;
          }
        }
    }
    expect(shown).toBeGreaterThan(200);
  });

  it('when the form has a girth of 1 in, then the field error reads "Girth must be at least 1 31/32 in"', async () => {
    const r = await specResolver({ ...presetSpec('collar'), girthMm: IN }, undefined, { fields: {}, shouldUseNativeValidation: false });
    expect(r.errors.girthMm?.message).toBe('Girth must be at least 1 31/32 in');
  });
});

describe('spec messages from the API', () => {
  let t: TestApp;
  let cookie: string;
  beforeAll(async () => {
    t = await createTestApp();
    const res = await request(t.app).post('/api/auth/sign-up').send(signUpBody()).expect(201);
    cookie = sessionCookieOf(res.headers['set-cookie']);
  });
  afterAll(async () => {
    await t.close();
  });

  it('when patterns are created with a bad value in each field, or a shape the engine refuses, then every 400 names fields by label only', async () => {
    const base = withSizes('collar');
    const bodies: { where: string; spec: unknown }[] = [];
    for (const { path, value } of leaves(base)) for (const probe of probesOf(value).filter((_, i, a) => i === 0 || i >= a.length - 4)) bodies.push({ where: path.join('.'), spec: setAt(base, path, probe) });
    const tooManyHoles = setAt(base, ['pieces', 0, 'end', 'holes', 'count'], 15);
    bodies.push({ where: 'holes past the buckle end', spec: setAt(tooManyHoles, ['pieces', 0, 'end', 'holes', 'spacingMm'], 40) });
    bodies.push({ where: 'size too small for its holes', spec: { ...base, sizes: [{ name: 'kitten', girthMm: 100 }] } });
    bodies.push({ where: 'round tip too wide', spec: setAt(base, ['pieces', 0, 'end', 'shape'], { kind: 'round', radiusMm: 40 }) });
    let refused = 0;
    for (const { where, spec } of bodies) {
      const res = await request(t.app).post('/api/patterns').set('Cookie', cookie).send({ name: 'Probe', kind: 'collar', spec });
      if (res.status === 201) continue;
      expect(res.status, where).toBe(400);
      expectHuman(res.body.error.message, `API ${where} message`);
      for (const m of Object.values(res.body.error.fields as Record<string, string>)) expectHuman(m, `API ${where} field`);
      refused++;
    }
    expect(refused).toBeGreaterThan(100);
  });

  it('when a size is too small for its tip holes, then the save names that size by name and in inches', async () => {
    const spec = { ...presetSpec('collar'), sizes: [{ name: 'kitten', girthMm: 4 * IN }] };
    const res = await request(t.app).post('/api/patterns').set('Cookie', cookie).send({ name: 'Probe', kind: 'collar', spec }).expect(400);
    expect(res.body.error.fields['spec.sizes.0.girthMm']).toMatch(/^Size kitten \(4 in\): Tip holes: 5 holes 3\/4 in apart need 6 in from the tip, [\d /]+ in available/);
  });

  it('when a pattern file carries a bad girth, then the import names it by label, not revisions.0.spec.girthMm', async () => {
    const file = {
      format: 'latchet-pattern',
      formatVersion: 1,
      exportedAt: '2026-12-02T03:00:00.000Z',
      pattern: { name: 'Probe', kind: 'collar', tags: [], archived: false },
      revisions: [{ number: 1, spec: { ...presetSpec('collar'), girthMm: 1 }, engineVersion: '1.0.0', note: '', createdAt: '2026-12-02T03:00:00.000Z', author: null, restoredFrom: null }],
    };
    const res = await request(t.app).post('/api/patterns/import').set('Cookie', cookie).send(file).expect(400);
    expect(res.body.error.fields).toEqual({ 'revisions.0.spec.girthMm': 'Girth must be at least 1 31/32 in' });
    expect(res.body.error.message).toBe('Girth must be at least 1 31/32 in');
  });
});
