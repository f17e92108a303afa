import { describe, expect, it } from 'vitest';
import { computeLayout, parseSpec, presetSpec } from '../pattern/index.ts';
import { upgradeSpec } from './spec-upgrade.ts';
import type { StrapSpec } from './strap-spec.ts';

/** The collar preset as a revision saved before holes were numbered from 1 stored it. */
function legacyCollar(): StrapSpec {
  const s = structuredClone(presetSpec('collar')) as unknown as { pieces: { end: { holes: Record<string, unknown> } }[] };
  const holes = s.pieces[0]!.end.holes;
  delete holes.middleHole;
  holes.nominalIndex = 2;
  return s as unknown as StrapSpec;
}

const holesOf = (s: StrapSpec) => {
  const end = s.pieces[0]!.end;
  if (end.kind !== 'adjustable') throw new Error('collar tip is adjustable');
  return end.holes as Record<string, unknown>;
};

describe('holes numbered from 1, old specs upgraded', () => {
  it('when an old spec with the middle hole counted from 0 is parsed, then it reads as middle hole 3 of 5 and the old field is gone', () => {
    const holes = holesOf(parseSpec(JSON.parse(JSON.stringify(legacyCollar()))));
    expect(holes.middleHole).toBe(3);
    expect(holes).not.toHaveProperty('nominalIndex');
  });

  it('when an old spec is read straight from storage, then upgradeSpec gives the same spec as the preset, and leaves its argument alone', () => {
    const old = legacyCollar();
    expect(upgradeSpec(old)).toEqual(presetSpec('collar'));
    expect(holesOf(old)).toHaveProperty('nominalIndex', 2);
  });

  it('when a spec is already numbered from 1, then upgradeSpec returns the very same object (no copy)', () => {
    const s = presetSpec('collar');
    expect(upgradeSpec(s)).toBe(s);
  });

  it('when an old spec is laid out without parsing, then the layout equals the new one (the fit table marks the same hole)', () => {
    expect(computeLayout(legacyCollar())).toEqual(computeLayout(presetSpec('collar')));
  });

  it('when neither field is given, then the middle of the row is the middle hole (3 of 5, 4 of 7)', () => {
    const s = legacyCollar();
    delete holesOf(s).nominalIndex;
    expect(holesOf(parseSpec(s)).middleHole).toBe(3);
    holesOf(s).count = 7;
    expect(holesOf(parseSpec(s)).middleHole).toBe(4);
  });
});
