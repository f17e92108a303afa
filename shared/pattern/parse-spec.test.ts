import { describe, expect, it } from 'vitest';
import { GIRTH_MIN_MM, StrapSpecSchema } from '../schemas/strap-spec.ts';
import { computeLayout, EngineError, parseSpec, presetSpec, PRESET_NAMES, specFromOptions } from './index.ts';

const caught = (f: () => unknown): EngineError => {
  try {
    f();
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error('did not throw');
};

describe('parseSpec and spec limits', () => {
  it('when every preset is parsed, then it validates unchanged against StrapSpecSchema (the schema forms and routes use)', () => {
    for (const n of PRESET_NAMES) expect(parseSpec(JSON.parse(JSON.stringify(presetSpec(n))))).toEqual(presetSpec(n));
    for (const n of PRESET_NAMES) expect(StrapSpecSchema.safeParse(presetSpec(n)).success).toBe(true);
  });

  it('when the girth is below the limit, then the error is placed on "girthMm" and reads with the label in the display unit', () => {
    const e = caught(() => parseSpec({ ...presetSpec('collar'), girthMm: 10 }));
    expect(e.field).toBe('girthMm');
    expect(e.limit).toBe(`at least ${GIRTH_MIN_MM}`);
    // 50 mm is 1.969 in; the limit is shown rounded up to the next 1/32 in so the value shown is accepted.
    expect(e.message).toBe('Girth must be at least 1 31/32 in');
    expect(caught(() => parseSpec({ ...presetSpec('collar'), units: 'mm', girthMm: 10 })).message).toBe('Girth must be at least 50 mm');
  });

  it('when the tip hole count is 0, then the error path is pieces.0.end.holes.count', () => {
    const s = presetSpec('collar') as unknown as { pieces: { end: { holes: { count: number } } }[] };
    s.pieces[0]!.end.holes.count = 0;
    const e = caught(() => parseSpec(s));
    expect(e.field).toBe('pieces.0.end.holes.count');
    expect(e.limit).toBe('at least 1');
  });

  it('when a required object is missing, then the message says which field is required', () => {
    const { hardware: _h, ...rest } = presetSpec('belt');
    expect(caught(() => parseSpec(rest)).message).toBe('Hardware is required');
  });

  it('when the middle hole is past the last hole, then computeLayout names the field and the highest hole, counted from 1', () => {
    const s = presetSpec('collar');
    const end = s.pieces[0]!.end;
    if (end.kind !== 'adjustable') throw new Error('preset changed');
    end.holes.middleHole = 6;
    const e = caught(() => computeLayout(s));
    expect(e.field).toBe('pieces.0.end.holes.middleHole');
    expect(e.limit).toBe('at most 5');
    expect(e.message).toBe('Tip middle hole: there is no hole 6; the tip has 5 holes');
  });

  it('when the holes need more strap than there is, then the error says how much they need and how much is available', () => {
    const s = presetSpec('collar');
    const end = s.pieces[0]!.end;
    if (end.kind !== 'adjustable') throw new Error('preset changed');
    end.holes.count = 15;
    end.holes.spacingMm = 40;
    const e = caught(() => computeLayout(s));
    expect(e.field).toBe('pieces.0.end.holes.count');
    // 14 x 40 mm + 3 in = 636.2 mm = 25 1/16 in (nearest 1/32 in).
    expect(e.message).toMatch(/^Tip holes: 15 holes 1 9\/16 in apart need 25 1\/16 in from the tip, [\d /]+ in available before the buckle end$/);
  });

  it('when options are typed as text, then "14in", "4mm" and fit mode reach the spec in mm', () => {
    const s = specFromOptions({ preset: 'collar', girth: '14in', thickness: '4mm', mode: 'fit' });
    expect(s.girthMm).toBeCloseTo(355.6, 9);
    expect(s.thickness).toEqual({ unit: 'mm', value: 4 });
    expect(s.mode).toBe('fit');
    expect(caught(() => specFromOptions({ preset: 'saddle' })).field).toBe('preset');
    expect(caught(() => specFromOptions({ girth: 'thirteen' })).field).toBe('girth');
  });
});

describe('parseSpec messages', () => {
  it('when a length is given as text, then the error says it must be a length in the display unit (not that it is missing)', () => {
    const e = caught(() => parseSpec({ ...presetSpec('collar'), girthMm: '13in' }));
    expect(e.field).toBe('girthMm');
    expect(e.message).toBe('Girth must be a length in inches');
    expect(e.limit).toBe('a number');
  });

  it('when an end shape kind is unknown, then the field is the shape kind and the limit lists the known kinds', () => {
    const s = presetSpec('collar') as unknown as { pieces: { end: { shape: unknown } }[] };
    s.pieces[0]!.end.shape = { kind: 'oval' };
    const e = caught(() => parseSpec(s));
    expect(e.field).toBe('pieces.0.end.shape.kind');
    expect(e.limit).toContain("'english-point'");
  });

  it('when the spec is not an object, then the error names the whole spec', () => {
    const e = caught(() => parseSpec(42));
    expect(e.field).toBe('(spec)');
    expect(e.limit).toBe('an object');
  });
});
