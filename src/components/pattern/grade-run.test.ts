import { describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { StrapSpecSchema } from '@shared/schemas/strap-spec.ts';
import { gradeRun } from './grade-run.ts';

const IN = 25.4; // mm per inch, exact (1959 agreement)
const spec = (kind: Parameters<typeof presetSpec>[0], sizes: { name: string; girthMm: number }[]) => StrapSpecSchema.parse({ ...presetSpec(kind), sizes });

describe('grading the size run for the editor', () => {
  it('when the spec has no sizes, then there is no run to show', () => {
    expect(gradeRun(spec('collar', []))).toBeNull();
  });

  it('when collar sizes are 4 in apart, then the 3 in span of five holes 3/4 in apart leaves a 1 in gap (collar preset, common practice)', () => {
    const run = gradeRun(spec('collar', [{ name: 'S', girthMm: 12 * IN }, { name: 'L', girthMm: 16 * IN }]));
    expect(run?.status).toBe('graded');
    if (run?.status !== 'graded') return;
    expect(run.report.joins).toHaveLength(1);
    expect(run.report.joins[0]!.kind).toBe('gap');
    expect(run.report.joins[0]!.mm).toBeCloseTo(1 * IN, 2);
  });

  it('when one size is too short for the five tip holes, then the run stops naming that size beside its girth (collar preset: 4 x 3/4 in + 3 in from the tip = 6 in)', () => {
    const run = gradeRun(spec('collar', [{ name: 'S', girthMm: 12 * IN }, { name: 'L', girthMm: 2 * IN }]));
    expect(run?.status).toBe('stopped');
    if (run?.status !== 'stopped') return;
    expect(run.message).toMatch(/^Size L \(2 in\): Tip holes: 5 holes 3\/4 in apart need 6 in from the tip/);
  });

  it('when the strap has no adjustment holes (bag strap), then the run stops with a sentence on the sizes field', () => {
    const run = gradeRun(spec('bag-strap', [{ name: 'Short', girthMm: 1000 }, { name: 'Long', girthMm: 1200 }]));
    expect(run).toMatchObject({ status: 'stopped', field: 'sizes' });
  });
});
