import { describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from '@shared/pattern/index.ts';
import { printRevisionInline } from '../../server/modules/print/index.ts';
import { pageSizesPt, pageText, writeOut } from './pdf-tools.ts';

const META = { patternName: 'Collar for Juniper', revision: 2, date: '2026-12-01' };

/** "13/32 in", "1 3/16 in", "3 in" -> mm (1 in = 25.4 mm). */
function inchesToMm(text: string): number {
  const m = /^(?:(\d+) )?(?:(\d+)\/(\d+)|(\d+)) in$/.exec(text.trim());
  if (!m) throw new Error(`not an inch length: ${text}`);
  const whole = Number(m[1] ?? 0) + (m[4] ? Number(m[4]) : 0);
  return (whole + (m[2] ? Number(m[2]) / Number(m[3]) : 0)) * 25.4;
}

describe('job sheet', () => {
  it('when the job sheet is asked for, then a last page lists cut list, hardware, rivet posts, punches, steps as a checklist and cautions', async () => {
    const spec = presetSpec('collar');
    const f = await printRevisionInline(spec, { paper: 'letter', jobSheet: true }, META);
    const without = await printRevisionInline(spec, { paper: 'letter' }, META);
    const pages = (await pageSizesPt(f.body)).length;
    expect(pages).toBe((await pageSizesPt(without.body)).length + 1);
    const text = pageText(writeOut('job-sheet.pdf', f.body), pages);
    for (const heading of ['Job sheet', 'Cut list', 'Hardware', 'Rivet posts', 'Punches', 'Steps', 'Cautions']) expect(text).toContain(heading);
    expect(text).toContain('1 x Collar: 21 in x 1 in');
    // The pet-collar caution applies to a collar (the product's caution list).
    expect(text).toContain('check the fit with two fingers');
  });

  it('when the collar rivets go through two layers of 10 oz, then the printed post is the stack + 2 to 3 mm (common practice), to the nearest 1/32 in', async () => {
    const spec = presetSpec('collar');
    const thickness = computeLayout(spec).thicknessMm;
    // 10 oz = 10/64 in (US Federal Test Method Standard No. 311 convention).
    expect(thickness).toBeCloseTo((10 / 64) * 25.4, 6);
    const f = await printRevisionInline(spec, { paper: 'letter', jobSheet: true }, META);
    const pages = (await pageSizesPt(f.body)).length;
    const text = pageText(writeOut('job-sheet-rivets.pdf', f.body), pages);
    const m = /through 2 layers: leather stack ([\d /]+ in), post ([\d /]+ in)/.exec(text);
    expect(m).not.toBeNull();
    const stack = inchesToMm(m?.[1] ?? '');
    const post = inchesToMm(m?.[2] ?? '');
    const half32 = 25.4 / 64; // rounding to the nearest 1/32 in
    expect(Math.abs(stack - 2 * thickness)).toBeLessThanOrEqual(half32);
    expect(post - 2 * thickness).toBeGreaterThanOrEqual(2 - half32);
    expect(post - 2 * thickness).toBeLessThanOrEqual(3 + half32);
  });
});
