// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { GIRTH_MIN_MM } from '@shared/schemas/strap-spec.ts';
import { draftFrom } from './draft.ts';

describe('the live preview draft', () => {
  it('when the collar preset is drafted in the page DOM, then an SVG sized in mm comes out with the strap piece', () => {
    const draft = draftFrom(presetSpec('collar'));
    expect(draft.status).toBe('drawn');
    if (draft.status !== 'drawn') return;
    expect(draft.svg).toMatch(/^<svg[^>]* width="[\d.]+mm"/);
    expect(draft.svg).toContain('id="piece-strap"');
  });

  it('when the girth grows by 1 in under a blank = girth + allowance rule, then the blank grows by 25.4 mm (common practice; 1 in = 25.4 mm)', () => {
    const spec = presetSpec('collar');
    const a = draftFrom(spec);
    const b = draftFrom({ ...spec, girthMm: spec.girthMm + 25.4 });
    if (a.status !== 'drawn' || b.status !== 'drawn') throw new Error('both drafts should draw');
    const blank = (d: typeof a) => d.layout.pieces.find((p) => p.role === 'strap')!.blankLengthMm;
    expect(blank(b) - blank(a)).toBeCloseTo(25.4, 6);
    expect(b.svg).not.toBe(a.svg);
  });

  it('when the girth is below the schema limit, then the draft stops and names the field by its label with the limit in the unit shown', () => {
    const collar = presetSpec('collar');
    const draft = draftFrom({ ...collar, units: 'mm', girthMm: GIRTH_MIN_MM - 1 });
    expect(draft.status).toBe('stopped');
    if (draft.status !== 'stopped') return;
    // The schema refused it (the editor's save and trial print wait), not the engine.
    expect(draft.by).toBe('schema');
    expect(draft.problems[0]).toEqual({ field: 'girthMm', message: `Girth must be at least ${GIRTH_MIN_MM} mm` });
    // In inches the same limit rounds up to the next 1/32 in: 50 mm = 1.9685 in -> 1 31/32 in (1 in = 25.4 mm).
    const inches = draftFrom({ ...collar, units: 'in', girthMm: GIRTH_MIN_MM - 1 });
    if (inches.status !== 'stopped') throw new Error('the draft should stop');
    expect(inches.problems[0]?.message).toBe('Girth must be at least 1 31/32 in');
  });
});
