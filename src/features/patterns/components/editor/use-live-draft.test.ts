// @vitest-environment happy-dom
import { act, renderHook } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { useLiveDraft, useSettledDraft } from './use-live-draft.ts';

/** The editor's two hooks as PatternEditor and PreviewDetails use them. */
function useBoth(values: unknown, revision?: string) {
  const live = useLiveDraft(values, revision);
  return { ...live, ...useSettledDraft(live.draft) };
}

describe('the live draft behind the editor', () => {
  it('when the girth changes, then the first render already holds the new drawing and the details follow in a deferred one', async () => {
    const collar = presetSpec('collar');
    const renders: { draft: unknown; settled: unknown }[] = [];
    const { result, rerender } = renderHook(
      ({ values }) => {
        const live = useBoth(values, '1');
        renders.push({ draft: live.draft, settled: live.settled });
        return live;
      },
      { initialProps: { values: collar as unknown } },
    );
    const first = result.current.draft;
    if (first.status !== 'drawn') throw new Error('the collar preset should draw');
    renders.length = 0;

    await act(async () => rerender({ values: { ...collar, girthMm: collar.girthMm + 25.4 } }));
    const next = result.current.draft;
    if (next.status !== 'drawn') throw new Error('1 in more girth should draw');
    expect(next.svg).not.toBe(first.svg);
    // The keystroke's own render draws the new values; the details still show the previous draft...
    expect(renders[0]?.draft).toBe(next);
    expect(renders[0]?.settled).toBe(first);
    // ...until the deferred render, which is never dropped.
    expect(renders.length).toBeGreaterThan(1);
    expect(result.current.settled).toBe(next);
  });

  it('when a value is refused, then the last drawing that worked stays for the faded preview and the draft names the field', async () => {
    const collar = presetSpec('collar');
    const { result, rerender } = renderHook(({ values }) => useBoth(values, '1'), { initialProps: { values: collar as unknown } });
    const good = result.current.draft;
    if (good.status !== 'drawn') throw new Error('the collar preset should draw');
    expect(result.current.lastSvg).toBe(good.svg);

    await act(async () => rerender({ values: { ...collar, girthMm: 1 } }));
    const stopped = result.current.draft;
    expect(stopped.status).toBe('stopped');
    if (stopped.status !== 'stopped') return;
    expect(stopped.by).toBe('schema');
    expect(stopped.problems[0]?.message).toMatch(/^Girth must be at least/);
    expect(result.current.lastSvg).toBe(good.svg);

    // A second refused value keeps the same last drawing.
    await act(async () => rerender({ values: { ...collar, girthMm: 2 } }));
    expect(result.current.lastSvg).toBe(good.svg);
  });

  it('when the spec has no size run, then nothing is graded; with one, the run is graded from the settled draft', async () => {
    const collar = presetSpec('collar');
    const { result, rerender } = renderHook(({ values }) => useBoth(values), { initialProps: { values: collar as unknown } });
    expect(result.current.run).toBeNull();
    const sizes = [
      { name: 'S', girthMm: 304.8 },
      { name: 'M', girthMm: 355.6 },
    ];
    await act(async () => rerender({ values: { ...collar, sizes } }));
    expect(result.current.run?.status).toBe('graded');
    if (result.current.run?.status !== 'graded') return;
    expect(result.current.run.report.sizes.map((s) => s.name)).toEqual(['S', 'M']);
  });
});
