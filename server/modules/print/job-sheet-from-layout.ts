import type { PatternLayout } from '@shared/pattern/index.ts';
import { formatLength } from '@shared/units/format-length.ts';
import { cautionKind, cautionsFor } from '@shared/pattern/cautions.ts';
import type { JobSheet } from './job-sheet.ts';

/**
 * The job sheet's content from a Layout: cut list, hardware, rivet posts, punches, the
 * construction as a checklist in working order, cautions and the Layout's warnings.
 */
export function jobSheetFromLayout(layout: PatternLayout, opts: { edgeGuideMm?: number; sizes?: number } = {}): JobSheet {
  const u = layout.units;
  const L = (mm: number) => formatLength(mm, u);
  const cl = layout.cutList;
  const steps: string[] = ['Check the print: the 1 in and 25 mm squares measure true before anything is cut.'];
  // A size run's blanks differ in length: one size's figures would mislead for the rest.
  const run = (opts.sizes ?? 1) > 1;
  if (run) steps.push(`Cut the blanks of all ${opts.sizes} sizes (the cut list), each along its own outline; mark each with its size.`);
  else for (const b of cl.blanks) steps.push(`Cut ${b.count} x ${b.name} blank, ${L(b.lengthMm)} x ${L(b.widthMm)}, along the outline.`);
  if (opts.edgeGuideMm) steps.push(`Scribe the edge guide ${L(opts.edgeGuideMm)} in from the edges.`);
  steps.push('Bevel the edges and burnish them.');
  for (const p of cl.punches) steps.push(`Punch ${p.holes} hole${p.holes === 1 ? '' : 's'}${run ? ' per strap' : ''} with the ${p.size} punch (${L(p.diameterMm)}), on the crosses.`);
  const slots = layout.pieces.flatMap((p) => p.features.filter((f) => f.kind === 'slot').map((f) => ({ p, f })));
  for (const { p, f } of slots) steps.push(`Cut the slot in ${p.name} at ${L(f.atMm)} from the buckle end${f.lengthMm ? `, ${L(f.lengthMm)} long` : ''}.`);
  for (const p of layout.pieces) {
    for (const f of p.folds) steps.push(`Skive the fold of ${p.name} thin, then fold it round the bar at ${L(f.atMm)} from the buckle end.`);
  }
  for (const f of cl.fasteners) {
    const post = f.postLengthMm !== undefined ? `, post ${L(f.postLengthMm)}` : '';
    steps.push(`Set ${f.count} ${f.kind}${f.count === 1 ? '' : 's'} through ${f.layers} layer${f.layers === 1 ? '' : 's'} (stack ${L(f.stackMm)}${post}).`);
  }
  // A run is printed smallest first (size-run.ts sorts by girth), so its figures are the least.
  if (cl.threadMm > 0) steps.push(`Stitch the rows (thread about ${L(cl.threadMm)}${run ? ' for the smallest size; more for the larger' : ''}).`);
  steps.push('Dye and finish; let it cure.');
  steps.push(cautionKind(layout.kind) === 'collar' ? 'Fit check: two fingers slip under the fastened collar.' : 'Fit check on the wearer or the load before handing over.');
  return {
    cutList: cl.blanks.map((b) => ({ piece: b.name, qty: b.count, blank: `${L(b.lengthMm)} x ${L(b.widthMm)}`, note: `${formatLength(b.thicknessMm, 'mm')} thick` })),
    hardware: cl.hardware.map((h) => `${h.count} x ${h.item}${h.note ? ` (${h.note})` : ''}`),
    rivets: cl.fasteners
      .filter((f) => f.kind === 'rivet')
      .map((f) => ({ where: `${f.count} x through ${f.layers} layer${f.layers === 1 ? '' : 's'}`, stack: L(f.stackMm), post: f.postLengthMm !== undefined ? `${L(f.postLengthMm)} (stack + 2-3 mm, common practice)` : 'n/a' })),
    punches: cl.punches.map((p) => ({ what: `${p.size} punch`, size: u === 'in' ? `${L(p.diameterMm)} (${formatLength(p.diameterMm, 'mm')})` : L(p.diameterMm), count: p.holes })),
    steps,
    cautions: cautionsFor(cautionKind(layout.kind)),
    warnings: layout.warnings.map((w) => w.message),
  };
}

/**
 * The job sheet for one size or a run: the cut list of every size, the construction and
 * hardware of the first (sizes share their construction), cautions once.
 */
export function jobSheetFromRun(run: readonly { size?: string; layout: PatternLayout; spec: { edgeGuideMm: number } }[]): JobSheet {
  const first = run[0];
  if (!first) throw new Error('job sheet: no layout');
  const base = jobSheetFromLayout(first.layout, { edgeGuideMm: first.spec.edgeGuideMm, sizes: run.length });
  if (run.length === 1) return base;
  const cutList = run.flatMap((r) => jobSheetFromLayout(r.layout).cutList.map((c) => ({ ...c, piece: `${c.piece}, size ${r.size ?? ''}`.trim() })));
  const warnings = run.flatMap((r) => r.layout.warnings.map((w) => `size ${r.size ?? ''}: ${w.message}`));
  // Hardware, rivets and punches are counted for one strap; say so, the run makes several.
  return {
    ...base,
    cutList,
    hardware: base.hardware.map((h) => `${h} per strap`),
    rivets: base.rivets.map((r) => ({ ...r, where: `${r.where} per strap` })),
    punches: base.punches.map((p) => ({ ...p, what: `${p.what} per strap` })),
    warnings,
  };
}
