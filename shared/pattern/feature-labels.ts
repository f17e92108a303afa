import type { DrawingItem } from '../render/drawing.ts';
import type { PieceSpec } from '../schemas/strap-spec.ts';
import { formatLength as formatLengthUnit, formatLengthBare as formatLengthBareUnit } from '../units/format-length.ts';
import { ASCENT_PER_EM, codePointCount, DESCENT_PER_EM, GLYPH_ADVANCE, LABEL_SIZE_MM, NAME_SIZE_MM, label, labelLine, textLengthMm } from './draw-labels.ts';
import { packLanes } from './label-lanes.ts';
import type { Feature, PieceLayout } from './layout-types.ts';

// formatLength builds a Fraction for every inch value, and the same lengths recur on every
// station, caption and redraw (a tenth of drawLayout's profile): their text is remembered.
// Keyed by the number itself, one map per unit and form: a string key made from the number
// cost about as much as the lookup saved (rememberedLength was 2 % of a collar SVG's profile).
const lengthTexts = { in: [new Map<number, string>(), new Map<number, string>()], mm: [new Map<number, string>(), new Map<number, string>()] };
function rememberedLength(mm: number, u: 'in' | 'mm', bare: boolean): string {
  // A Map does not tell -0 from 0, whose texts may differ; -0 is rare, so it is not remembered.
  if (Object.is(mm, -0)) return lengthText(mm, u, bare);
  const texts = lengthTexts[u][bare ? 1 : 0]!;
  let text = texts.get(mm);
  if (text === undefined) {
    if (texts.size >= 1024) texts.clear();
    text = lengthText(mm, u, bare);
    texts.set(mm, text);
  }
  return text;
}
const lengthText = (mm: number, u: 'in' | 'mm', bare: boolean) => (bare ? formatLengthBareUnit(mm, u) : formatLengthUnit(mm, u));
const formatLength = (mm: number, u: 'in' | 'mm') => rememberedLength(mm, u, false);
const formatLengthBare = (mm: number, u: 'in' | 'mm') => rememberedLength(mm, u, true);

/** Features closer than this along the strap share one station: one label, one distance (mm). */
const SAME_STATION_MM = 0.05;
/** Baseline-to-baseline step between label lanes, mm. */
const LANE_STEP_MM = (ASCENT_PER_EM + DESCENT_PER_EM) * LABEL_SIZE_MM + 0.6;

/** What a feature is, in the fewest words a maker needs: size, punch, fastener, layers. */
export function featureText(f: Feature, u: 'in' | 'mm'): string {
  if (f.kind === 'slot') return `slot ${formatLength(f.lengthMm ?? 0, u)} x ${formatLength(f.widthMm ?? 0, u)}`;
  if (f.kind === 'fold') return f.label;
  const what = f.kind === 'adjust-hole' ? 'hole' : firstClause(f.label);
  const layers = f.layers && f.layers > 1 ? `, ${f.layers} layers` : f.partnerAtMm === undefined && f.kind !== 'adjust-hole' ? ', 1 layer' : '';
  const size = f.punch?.size ?? '';
  const text = `Ø${formatLength(f.diameterMm ?? 0, u)} ${size ? `${size} ` : ''}${what}${layers}`;
  // Whitespace is collapsed to one space and trimmed, but only when there is any to change:
  // the replace made a new string for every label of every drawing (featureText was 2 % of a
  // collar SVG's profile), and engine-made texts have none.
  return UNEVEN_SPACE.test(text) ? text.replace(/\s+/g, ' ').trim() : text;
}

/** Whitespace that `replace(/\s+/g, ' ').trim()` would change: a run, a tab or the like, or at either end. */
const UNEVEN_SPACE = /\s\s|[^\S ]|^\s|\s$/;

/** A label up to its first comma ("rivet, 2 layers" -> "rivet"), as `split(',')[0]` gives it. */
function firstClause(label: string): string {
  const comma = label.indexOf(',');
  return comma < 0 ? label : label.slice(0, comma);
}

interface Station {
  atMm: number;
  features: Feature[];
  text: string;
  count: number;
}

function stationsOf(features: readonly Feature[], u: 'in' | 'mm'): Station[] {
  const out: { atMm: number; features: Feature[] }[] = [];
  for (const f of features) {
    const last = out[out.length - 1];
    if (last && Math.abs(last.atMm - f.atMm) < SAME_STATION_MM) last.features.push(f);
    else out.push({ atMm: f.atMm, features: [f] });
  }
  return out.map((s) => {
    const texts = s.features.map((f) => featureText(f, u));
    // Distinct texts in first-seen order, as a Set keeps them, without making one per station.
    const uniq = texts.filter((t, i) => texts.indexOf(t) === i);
    // Several identical holes across the strap at one station read "2 x ..."; a fold and its slot "fold, slot ...".
    const text = uniq.length === 1 ? uniq[0]! : uniq.join(', ');
    return { atMm: s.atMm, features: s.features, text, count: uniq.length === 1 ? texts.length : 1 };
  });
}

/** Everything printed round one piece: feature labels above, datum distances below, the caption under them. */
export interface PieceLabels {
  items: DrawingItem[];
}

/** Word-wraps a caption line to about `maxMm` at the label size. */
function wrap(text: string, maxMm: number): string[] {
  const lines: string[] = [];
  let cur = '';
  // The line's length is counted as it grows (the same sum textLengthMm would make of the
  // joined text): measuring the whole line again for every word was quadratic.
  let curCount = 0;
  for (const w of text.split(' ')) {
    const count = codePointCount(w);
    const nextCount = cur ? curCount + 1 + count : count;
    if (cur && nextCount * LABEL_SIZE_MM * GLYPH_ADVANCE > maxMm) {
      lines.push(cur);
      cur = w;
      curCount = count;
    } else {
      cur = cur ? `${cur} ${w}` : w;
      curCount = nextCount;
    }
  }
  if (cur) lines.push(cur);
  return lines;
}

/**
 * Labels of one piece, horizontal and staggered so none overlaps another or the outline:
 * above the strap one label per run of identical features ("2 x Ø1/8 in #3 rivet, 2 layers"
 * over a bracket), adjustment holes numbered; below it a dimension line from the datum with
 * every station's distance (bare numbers, the caption names the unit); then the caption:
 * name and size, the legend (unit, datum, what each adjustment hole fits), stitching.
 * `extra` adds notes above the strap (e.g. where D-rings ride) and caption lines.
 */
export function pieceLabels(piece: PieceLayout, ps: PieceSpec, u: 'in' | 'mm', extra: { above?: { atMm: number; text: string }[]; caption?: string[] } = {}): PieceLabels {
  const items: DrawingItem[] = [];
  const W = piece.widthMm;
  const L = piece.blankLengthMm;
  const stations = stationsOf(piece.features, u);

  // Above: adjustment-hole numbers first (they must sit right over their holes), then groups.
  const above: { x: number; text: string; bold?: boolean }[] = [];
  const brackets: { from: number; to: number; ticks: number[] }[] = [];
  const adjust = piece.features.filter((f) => f.kind === 'adjust-hole');
  const nominal = piece.fit?.nominalIndex;
  adjust.forEach((f, i) => above.push({ x: f.atMm, text: `${i + 1}`, ...(i === nominal ? { bold: true } : {}) }));
  for (let i = 0; i < stations.length; ) {
    let j = i;
    while (j + 1 < stations.length && stations[j + 1]!.text === stations[i]!.text) j++;
    const run = stations.slice(i, j + 1);
    const total = run.reduce((s, st) => s + st.count, 0);
    const isAdjust = run[0]!.features[0]!.kind === 'adjust-hole';
    const nominalNote = isAdjust && nominal !== undefined && adjust.length > 1 ? `, no. ${nominal + 1} the middle hole` : '';
    const text = `${total > 1 ? `${total} x ` : ''}${run[0]!.text}${nominalNote}`;
    const from = run[0]!.atMm, to = run[run.length - 1]!.atMm;
    above.push({ x: (from + to) / 2, text });
    if (run.length > 1) brackets.push({ from, to, ticks: run.map((s) => s.atMm) });
    i = j + 1;
  }
  for (const n of extra.above ?? []) above.push({ x: n.atMm, text: n.text });
  const topY = -W / 2 - 0.9;
  for (const b of brackets) {
    items.push(labelLine(b.from, topY, b.to, topY));
    for (const t of b.ticks) items.push(labelLine(t, topY, t, topY + 0.6));
  }
  // Each label centred over its feature, or failing that starting or ending just beside it.
  const SIDE_MM = 2;
  const placeOf = (x: number, text: string) => {
    const w = textLengthMm(text, LABEL_SIZE_MM);
    return [
      { minX: x - w / 2, maxX: x + w / 2, anchor: 'middle' as const, ax: x },
      { minX: x - SIDE_MM, maxX: x - SIDE_MM + w, anchor: 'start' as const, ax: x - SIDE_MM },
      { minX: x + SIDE_MM - w, maxX: x + SIDE_MM, anchor: 'end' as const, ax: x + SIDE_MM },
    ];
  };
  const aboveCands = above.map((a) => (a.text.length <= 2 ? placeOf(a.x, a.text).slice(0, 1) : placeOf(a.x, a.text)));
  const aboveLanes = packLanes(aboveCands);
  const base0 = topY - 0.5 - DESCENT_PER_EM * LABEL_SIZE_MM;
  above.forEach((a, i) => {
    const { lane, choice } = aboveLanes[i]!;
    const c = aboveCands[i]![choice]!;
    items.push(label(c.ax, base0 - lane * LANE_STEP_MM, a.text, { anchor: c.anchor, ...(a.bold ? { weight: 'bold' as const } : {}) }));
  });

  // Below: the dimension line from the datum, a tick and a distance at every station and at the blank's end.
  const dimY = W / 2 + 2;
  items.push(labelLine(0, dimY, L, dimY));
  const dists = [{ x: 0, text: '0' }, ...stations.map((s) => ({ x: s.atMm, text: formatLengthBare(s.atMm, u) })), { x: L, text: formatLengthBare(L, u) }];
  for (const d of dists) items.push(labelLine(d.x, dimY - 1.2, d.x, dimY + 1.2));
  // Distances stay centred on their tick (a sideways shift would read as another station).
  const distLanes = packLanes(dists.map((d) => placeOf(d.x, d.text).slice(0, 1))).map((p) => p.lane);
  const dBase0 = dimY + 1.6 + ASCENT_PER_EM * LABEL_SIZE_MM;
  dists.forEach((d, i) => items.push(label(d.x, dBase0 + distLanes[i]! * LANE_STEP_MM, d.text, { anchor: 'middle' })));
  const lowest = dBase0 + Math.max(0, ...distLanes) * LANE_STEP_MM;

  // Caption: name and size, then the legend.
  const nameY = lowest + DESCENT_PER_EM * LABEL_SIZE_MM + 1.2 + ASCENT_PER_EM * NAME_SIZE_MM;
  items.push(label(0, nameY, `${piece.name}${piece.count > 1 ? ` x ${piece.count}` : ''}: ${formatLength(L, u)} x ${formatLength(W, u)} blank`, { sizeMm: NAME_SIZE_MM, weight: 'bold' }));
  const buckleEnd = ps.start.kind === 'fold-over';
  const legend: string[] = [`Distances in ${u === 'in' ? 'inches' : 'mm'} from 0${buckleEnd ? ' at the buckle end' : ' at this end'}; the last is the blank's end.`];
  if (piece.fit && adjust.length) {
    const fits = piece.fit.holes.map((h, i) => `${formatLengthBare(h.innerMm, u)}${i === piece.fit!.nominalIndex ? ' (middle hole)' : ''}`);
    legend.push(`Holes 1-${fits.length} fit ${fits.join(', ')} ${u} inside.`);
  }
  if (piece.stitchRows.length) {
    const holes = piece.stitchRows.reduce((a, r) => a + r.holes.length, 0);
    const thread = piece.stitchRows.reduce((a, r) => a + r.threadMm, 0);
    const pitches = [...new Set(piece.stitchRows.map((r) => `${String(r.pitchMm)} mm iron at ${r.adjustedPitchMm.toFixed(2)} mm`))].join(', ');
    legend.push(`Stitching: ${piece.stitchRows.length} row${piece.stitchRows.length > 1 ? 's' : ''}, ${holes} holes, ${pitches}; thread about ${formatLength(thread, u)} (4 x seam, common practice).`);
  }
  legend.push(...(extra.caption ?? []));
  const maxMm = Math.max(L, 110);
  const lines = wrap(legend.join(' '), maxMm);
  lines.forEach((t, i) => items.push(label(0, nameY + 1 + DESCENT_PER_EM * NAME_SIZE_MM + ASCENT_PER_EM * LABEL_SIZE_MM + i * LANE_STEP_MM, t)));
  return { items };
}

