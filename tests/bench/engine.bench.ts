// Engine benchmark (`npm run bench engine`): layouts and SVGs per second for each preset, a
// 12-size run, and the SVG writer against the svg.js-over-svgdom reference renderer. Figures
// depend on the machine and its load; each row also gives the ratio to a baseline measured in
// the same run (a JSON round trip of the same spec). Targets (issue 10) are per core, so they
// are checked against operations per CPU second of this process.
import { computeLayout, drawLayout, gradeSizes, parseSpec, presetSpec, PRESET_NAMES, type StrapSpec } from '@shared/pattern/index.ts';
import { renderSvg } from '@shared/render/svg.ts';
import { renderSvgViaDom } from '@shared/render/svg-via-dom.ts';
import { svgdomDom } from '../../server/render/svgdom-window.ts';
import { machineLine, medianMs, num, rate, verdict } from './measure.ts';

console.log(machineLine());

const TARGET = { layoutsPerS: 5000, svgsPerS: 1000, runMs: 20 };

// Warm the whole engine first, every preset, so the first row is not timed while V8 is still
// optimising code all presets share (on a loaded machine that takes seconds).
const warmStart = performance.now();
while (performance.now() - warmStart < 3000) for (const name of PRESET_NAMES) renderSvg(drawLayout(computeLayout(parseSpec(presetSpec(name))), presetSpec(name)));

console.log('preset        baseline/cpu-s   layouts/s wall  /cpu-s  (x baseline)   svgs/s wall  /cpu-s  (x baseline)');
const rows: { name: string; layouts: number; svgs: number }[] = [];
for (const name of PRESET_NAMES) {
  const spec: StrapSpec = presetSpec(name);
  const baseline = rate(() => JSON.parse(JSON.stringify(spec)));
  const layouts = rate(() => computeLayout(parseSpec(spec)));
  const svgs = rate(() => renderSvg(drawLayout(computeLayout(parseSpec(spec)), spec)));
  rows.push({ name, layouts: layouts.perCpuS, svgs: svgs.perCpuS });
  console.log(
    `${name.padEnd(12)} ${num(baseline.perCpuS, 14)}   ${num(layouts.perWallS, 14)} ${num(layouts.perCpuS, 7)}  (${(layouts.perCpuS / baseline.perCpuS).toFixed(4)})   ${num(svgs.perWallS, 11)} ${num(svgs.perCpuS, 7)}  (${(svgs.perCpuS / baseline.perCpuS).toFixed(4)})`,
  );
}

// A 12-size collar run, 9 in to 20 in neck: graded (each size laid out) and drawn for printing.
const collar = presetSpec('collar');
const sizes = Array.from({ length: 12 }, (_, i) => ({ name: `S${i + 1}`, girthMm: 228.6 + i * 25.4 }));
const runSpec = parseSpec({ ...collar, sizes });
const baselineMs = await medianMs(() => JSON.parse(JSON.stringify(runSpec)), 21, 30);
const gradeMs = await medianMs(() => gradeSizes(runSpec), 21, 30);
const drawnMs = await medianMs(() => sizes.map((s) => { const one = parseSpec({ ...collar, girthMm: s.girthMm }); return drawLayout(computeLayout(one), one); }), 21, 30);
console.log(`\n12-size collar run (median of 21 after 30 warm-ups)       ms    (x baseline ${baselineMs.toFixed(3)} ms)`);
console.log(`graded: every size laid out        ${gradeMs.toFixed(2).padStart(8)}    (${(gradeMs / baselineMs).toFixed(1)})`);
console.log(`laid out and drawn, as for print   ${drawnMs.toFixed(2).padStart(8)}    (${(drawnMs / baselineMs).toFixed(1)})`);

// The SVG writer against the reference it must match byte for byte (shared/render/svg.test.ts).
const ws = presetSpec('watch-strap');
const drawing = drawLayout(computeLayout(ws), ws);
const svgdom = svgdomDom();
const direct = rate(() => renderSvg(drawing), 800);
const viaDom = rate(() => renderSvgViaDom(drawing, svgdom), 800);
console.log('\nwatch-strap drawing, renders per CPU s (ratio to svg.js + svgdom)');
console.log(`svg.js + svgdom (reference)  ${num(viaDom.perCpuS)}  (1.00)`);
console.log(`direct writer                ${num(direct.perCpuS)}  (${(direct.perCpuS / viaDom.perCpuS).toFixed(2)})`);

const collarRow = rows.find((r) => r.name === 'collar')!;
console.log('\ntargets (per CPU second = per core)');
console.log(`collar layouts/s >= ${TARGET.layoutsPerS}: ${num(collarRow.layouts, 0)}  ${verdict(collarRow.layouts >= TARGET.layoutsPerS)}`);
console.log(`collar SVGs/s >= ${TARGET.svgsPerS}: ${num(collarRow.svgs, 0)}  ${verdict(collarRow.svgs >= TARGET.svgsPerS)}`);
console.log(`12-size run graded < ${TARGET.runMs} ms: ${gradeMs.toFixed(2)} ms  ${verdict(gradeMs < TARGET.runMs)}`);
