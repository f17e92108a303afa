// Engine benchmark (`npm run bench engine`): layouts and SVGs per second for each preset, and
// one drawing through svg.js over svgdom versus over browser-style DOMs (happy-dom, jsdom).
// Figures are machine-dependent; the table reports ratios against a baseline measured in the
// same run (a JSON round trip of the same spec), so runs on different machines compare.
import { JSDOM } from 'jsdom';
import { Window } from 'happy-dom';
import { computeLayout, drawLayout, parseSpec, presetSpec, PRESET_NAMES, type StrapSpec } from '@shared/pattern/index.ts';
import { renderSvg, type SvgDom } from '@shared/render/svg.ts';
import { svgdomDom } from '../../server/render/svgdom-window.ts';

/** Runs `fn` repeatedly for about `ms` after a warm-up; returns operations per second. */
function opsPerSecond(fn: () => unknown, ms = 400): number {
  for (let i = 0; i < 20; i++) fn();
  (globalThis as { gc?: () => void }).gc?.();
  let n = 0;
  const start = performance.now();
  let now = start;
  while (now - start < ms) {
    for (let i = 0; i < 10; i++) fn();
    n += 10;
    now = performance.now();
  }
  return (n * 1000) / (now - start);
}

const fmt = (v: number) => (v >= 100 ? v.toFixed(0) : v.toFixed(1)).padStart(8);
const svgdom = svgdomDom();
const hw = new Window();
const happy: SvgDom = { window: hw, document: hw.document };
const jd = new JSDOM('<!doctype html><html><body></body></html>');
const jsdom: SvgDom = { window: jd.window, document: jd.window.document };

console.log('preset        baseline/s  layouts/s  (x baseline)   svgs/s  (x baseline)');
for (const name of PRESET_NAMES) {
  const spec: StrapSpec = presetSpec(name);
  const baseline = opsPerSecond(() => JSON.parse(JSON.stringify(spec)));
  const layouts = opsPerSecond(() => computeLayout(parseSpec(spec)));
  const svgs = opsPerSecond(() => renderSvg(drawLayout(computeLayout(parseSpec(spec)), spec), svgdom), 600);
  console.log(`${name.padEnd(12)} ${fmt(baseline)}   ${fmt(layouts)}  (${(layouts / baseline).toFixed(4)})  ${fmt(svgs)}  (${(svgs / baseline).toFixed(4)})`);
}

const spec = presetSpec('watch-strap');
const drawing = drawLayout(computeLayout(spec), spec);
const viaSvgdom = opsPerSecond(() => renderSvg(drawing, svgdom), 800);
const viaHappy = opsPerSecond(() => renderSvg(drawing, happy), 800);
const viaJsdom = opsPerSecond(() => renderSvg(drawing, jsdom), 800);
console.log('\nwatch-strap drawing, renders/s by DOM (ratio to svgdom)');
console.log(`svg.js + svgdom     ${fmt(viaSvgdom)}  (1.00)`);
console.log(`svg.js + happy-dom  ${fmt(viaHappy)}  (${(viaHappy / viaSvgdom).toFixed(2)})  browser-style DOM`);
console.log(`svg.js + jsdom      ${fmt(viaJsdom)}  (${(viaJsdom / viaSvgdom).toFixed(2)})  browser-style DOM`);
