import { afterAll, describe, expect, it } from 'vitest';
import { computeLayout, presetSpec } from '@shared/pattern/index.ts';
import { Window } from 'happy-dom';
import { printRevision, printRevisionInline, stopPrintWorker, PrintOptionsError } from '../../server/modules/print/index.ts';
import { CUTTER_COLORS } from '../../server/modules/print/cutter-svg.ts';
import { pathPointBox } from './svg-path.ts';
import { pageSizesPt, pageText, writeOut } from './pdf-tools.ts';

// A five-size collar run 2 in apart (common practice for dog collar sizing steps).
const RUN = [
  { name: 'XS', girthMm: 254 },
  { name: 'S', girthMm: 304.8 },
  { name: 'M', girthMm: 355.6 },
  { name: 'L', girthMm: 406.4 },
  { name: 'XL', girthMm: 457.2 },
];
const META = { patternName: 'Collar for Juniper', revision: 4, date: '2026-12-01T09:00:00Z', sizes: RUN };

afterAll(() => stopPrintWorker());

describe('printing a saved revision from its spec', () => {
  it('when the collar preset (13 in neck + 8 in, common practice) prints on Letter, then the pages carry the engine blank length and a useful file name', async () => {
    const spec = presetSpec('collar');
    const blank = computeLayout(spec).pieces[0]!.blankLengthMm;
    const f = await printRevisionInline(spec, { paper: 'letter' }, META);
    expect(f.contentType).toBe('application/pdf');
    expect(f.fileName).toBe('collar-for-juniper-r4-letter.pdf');
    const path = writeOut('revision-collar.pdf', f.body);
    expect(blank).toBeCloseTo(21 * 25.4, 6);
    expect(pageText(path, 1)).toContain('blank 21 in (533.4 mm)');
    expect(pageText(path, 1)).toContain('rev 4');
  });

  it('when the cutter export of the collar preset is made, then its outline spans exactly the blank the engine computed', async () => {
    const spec = presetSpec('collar');
    const piece = computeLayout(spec).pieces[0]!;
    const f = await printRevisionInline(spec, {}, META, 'cutter.svg');
    const doc = new (new Window().DOMParser)().parseFromString(f.body.toString('utf8'), 'image/svg+xml');
    expect(doc.documentElement.getAttribute('width')).toBe(`${piece.blankLengthMm.toFixed(3)}mm`);
    expect(doc.documentElement.getAttribute('height')).toBe(`${piece.widthMm.toFixed(3)}mm`);
    const outline = pathPointBox(doc.querySelector(`g[stroke="${CUTTER_COLORS.cut}"] path`)?.getAttribute('d') ?? '');
    expect(outline.maxX - outline.minX).toBeCloseTo(piece.blankLengthMm, 3);
    expect(doc.querySelectorAll('text').length).toBe(0);
  });

  it('when a five-size run prints, then it runs on the worker with progress and gives the same bytes as the inline path', async () => {
    const spec = presetSpec('collar');
    const seen: string[] = [];
    const viaWorker = await printRevision(spec, { paper: 'letter', size: 'all', jobSheet: true }, META, 'pdf', (p) => seen.push(`${p.stage} ${p.done}/${p.total}`));
    const inline = await printRevisionInline(spec, { paper: 'letter', size: 'all', jobSheet: true }, META);
    expect(viaWorker.body.equals(inline.body)).toBe(true);
    expect(seen).toContain('layout 5/5');
    const pages = (await pageSizesPt(viaWorker.body)).length;
    expect(seen.at(-1)).toBe(`pages ${pages}/${pages}`);
    const path = writeOut('revision-run.pdf', viaWorker.body);
    const all = Array.from({ length: pages }, (_, i) => pageText(path, i + 1)).join('\n');
    for (const s of RUN) expect(all).toContain(`size ${s.name}`);
    expect(pageText(path, pages)).toContain('Job sheet');
  });

  it('when one revision was printed before another in the same process, then the second reads back whole (ToUnicode for every glyph, as a fresh process gives)', async () => {
    const spec = presetSpec('collar');
    await printRevisionInline(spec, { paper: 'letter' }, META);
    const f = await printRevisionInline(spec, { paper: 'letter', size: 'all', jobSheet: true }, META);
    const path = writeOut('revision-second.pdf', f.body);
    expect(pageText(path, 1)).toMatch(/Collar, size [A-Z]+ · blank/);
  });

  it('when the worker meets a size that is not in the run, then the same field error comes back', async () => {
    const spec = presetSpec('collar');
    await expect(printRevision(spec, { size: 'XXL' }, META)).rejects.toThrow(PrintOptionsError);
    await expect(printRevision(spec, { size: 'all' }, { ...META, sizes: [...RUN, { name: 'tiny', girthMm: 60 }] })).rejects.toMatchObject({ name: 'EngineError' });
  });
});
