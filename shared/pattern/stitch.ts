import type { PieceSpec } from '../schemas/strap-spec.ts';
import { chainStretch, chainXRange, crossingsAtX, directionAlong, pointAlong, reverseStretch, spanLength, type ChainPlace, type PrimSpan } from './chain-path.ts';
import { fieldError, lengthIn, MM_WORDING, type Wording } from './engine-error.ts';
import { specLabel } from '../schemas/spec-labels.ts';
import type { StitchRowLayout, Warning } from './layout-types.ts';
import { insetChain } from './offset.ts';
import type { Prim, Pt } from './prims.ts';
import type { WidthProfile } from './width-profile.ts';

/** Saddle stitch uses about four times the seam length of thread (common practice). */
export const THREAD_PER_SEAM = 4;
/**
 * A change of direction sharper than this (degrees) is a corner and always gets a hole: the
 * tip of a spear or English point, chamfer joins, a turn across the strap. Tangent joins
 * (a round end or an English point's arcs meeting the edges) and the slight bends of a
 * taper are not corners.
 */
export const CORNER_DEG = 3;

type Row = PieceSpec['stitchRows'][number];

/** Angle (degrees) between two unit directions. */
function turnDeg(a: Pt, b: Pt): number {
  const dot = Math.min(1, Math.max(-1, a.x * b.x + a.y * b.y));
  return (Math.acos(dot) * 180) / Math.PI;
}

/** Holes at an even pitch along one corner-free run of spans, landing on both ends. */
function runHoles(run: readonly PrimSpan[], pitchMm: number): { holes: Pt[]; lengthMm: number; adjustedMm: number } {
  const lengthMm = run.reduce((s, sp) => s + spanLength(sp), 0);
  const n = Math.max(1, Math.round(lengthMm / pitchMm));
  const adjustedMm = lengthMm / n;
  const holes: Pt[] = [];
  let k = 0;
  let before = 0;
  for (let i = 0; i <= n; i++) {
    const s = i === n ? lengthMm : i * adjustedMm;
    while (k < run.length - 1 && s > before + spanLength(run[k]!)) before += spanLength(run[k++]!);
    const sp = run[k]!;
    holes.push(pointAlong(sp.prim, sp.fromMm + Math.min(s - before, spanLength(sp))));
  }
  return { holes, lengthMm, adjustedMm };
}

/** Splits a stretch into runs at its corners. */
function splitAtCorners(spans: readonly PrimSpan[]): PrimSpan[][] {
  const runs: PrimSpan[][] = [];
  for (const sp of spans) {
    const last = runs[runs.length - 1];
    const prev = last?.[last.length - 1];
    if (last && prev && turnDeg(directionAlong(prev.prim, prev.toMm), directionAlong(sp.prim, sp.fromMm)) <= CORNER_DEG) last.push(sp);
    else runs.push([sp]);
  }
  return runs;
}

/** The two places (top: least y; bottom: most y) where x = `x` crosses the inset loop. */
function topBottom(loop: readonly Prim[], x: number): { top: ChainPlace; bottom: ChainPlace } {
  const c = crossingsAtX(loop, x);
  const top = c.reduce((m, p) => (p.pt.y < m.pt.y ? p : m), c[0]!);
  const bottom = c.reduce((m, p) => (p.pt.y > m.pt.y ? p : m), c[0]!);
  return { top, bottom };
}

function line(a: Pt, b: Pt): PrimSpan {
  const prim: Prim = { type: 'line', a, b };
  return { prim, fromMm: 0, toMm: Math.hypot(b.x - a.x, b.y - a.y) };
}

/**
 * Lays out one stitch row on the offset of the whole cut outline (`outline`, a closed
 * clockwise chain of lines and arcs), `offsetMm` inside it, between x = from and x = to:
 * along the edges, and round the end shapes where the row reaches into them (round,
 * clipped, English point, spear). `around-start`/`around-end` turn across the strap where
 * the row's range cuts the loop, or follow the end shape when the range takes it in. The
 * row is split at corners; on each run the pitch is stretched or shrunk so holes land at
 * both ends and on every corner, with a warning when the change exceeds the tolerance.
 */
export function layoutStitchRow(row: Row, profile: WidthProfile, outline: readonly Prim[], lengthMm: number, field: string, pieceId: string, w: Wording = MM_WORDING): { rows: StitchRowLayout[]; warnings: Warning[] } {
  const len = lengthIn(w);
  const x0 = row.fromRef === 'start' ? row.fromMm : lengthMm - row.fromMm;
  const x1 = row.toRef === 'start' ? row.toMm : lengthMm - row.toMm;
  if (!(x1 - x0 > row.pitchMm)) throw fieldError(w, `${field}.toMm`, `the row runs from ${len(x0)} to ${len(x1)} along the blank; it must finish at least one stitch after it starts`, `after ${len(x0 + row.pitchMm)}`);
  if (x0 < -1e-6 || x1 > lengthMm + 1e-6) throw fieldError(w, `${field}.fromMm`, `the row from ${len(x0)} to ${len(x1)} runs off the ${len(lengthMm)} blank`, `within 0 to ${len(lengthMm)}`);
  if (row.offsetMm * 2 >= Math.min(profile.at(x0), profile.at(x1))) throw fieldError(w, `${field}.offsetMm`, `${len(row.offsetMm)} in from one edge meets the other edge`, 'less than half the width');
  const loop = insetChain(outline, row.offsetMm);
  const ext = chainXRange(loop);
  // Past the loop's extent the row simply runs to its far point (a tip, a round end's apex).
  const eps = 1e-9;
  const a = Math.min(Math.max(x0, ext.minX), ext.maxX);
  const b = Math.min(Math.max(x1, ext.minX), ext.maxX);
  if (!(b - a > row.pitchMm)) throw fieldError(w, `${field}.toMm`, `the row from ${len(x0)} to ${len(x1)} is shorter than one stitch once it is ${len(row.offsetMm)} inside the edge`, `longer than ${len(row.pitchMm)}`);
  const A = topBottom(loop, a);
  const B = topBottom(loop, b);
  const cutsStart = x0 > ext.minX + eps;
  const cutsEnd = x1 < ext.maxX - eps;
  const top = chainStretch(loop, A.top, B.top);
  const bottom = reverseStretch(chainStretch(loop, B.bottom, A.bottom));
  const stretches: PrimSpan[][] =
    row.path === 'both-edges' ? [top, bottom]
    : row.path === 'top-edge' ? [top]
    : row.path === 'bottom-edge' ? [bottom]
    : row.path === 'around-end' ? [cutsEnd ? [...top, line(B.top.pt, B.bottom.pt), ...reverseStretch(bottom)] : chainStretch(loop, A.top, A.bottom)]
    : [cutsStart ? [...reverseStretch(bottom), line(A.bottom.pt, A.top.pt), ...top] : chainStretch(loop, B.bottom, B.top)];
  const rows: StitchRowLayout[] = [];
  const warnings: Warning[] = [];
  for (const spans of stretches) {
    const runs = splitAtCorners(spans.filter((sp) => spanLength(sp) > 1e-9));
    const holes: Pt[] = [];
    const points: Pt[] = [];
    let seam = 0;
    let worst = row.pitchMm;
    for (const run of runs) {
      const r = runHoles(run, row.pitchMm);
      holes.push(...(holes.length ? r.holes.slice(1) : r.holes));
      if (!points.length) points.push(r.holes[0]!);
      points.push(r.holes[r.holes.length - 1]!);
      seam += r.lengthMm;
      if (Math.abs(r.adjustedMm - row.pitchMm) > Math.abs(worst - row.pitchMm)) worst = r.adjustedMm;
    }
    const offPct = (Math.abs(worst - row.pitchMm) / row.pitchMm) * 100;
    if (offPct > row.tolerancePct + 1e-9)
      warnings.push({ code: 'stitch-pitch-off', pieceId, message: `${specLabel(field, w)}: pitch ${row.pitchMm} mm had to become ${worst.toFixed(2)} mm (${offPct.toFixed(1)} %, tolerance ${row.tolerancePct} %)` });
    rows.push({ points, holes, pitchMm: row.pitchMm, adjustedPitchMm: worst, seamLengthMm: seam, threadMm: THREAD_PER_SEAM * seam });
  }
  // Both edges run into one point (the tip of a spear or English point, a round end's apex, or
  // the same at the start): the hole there is shared, so the bottom row does not punch it again.
  if (rows.length === 2) {
    const [t, b] = rows as [StitchRowLayout, StitchRowLayout];
    const same = (p: Pt | undefined, q: Pt | undefined) => !!p && !!q && Math.hypot(p.x - q.x, p.y - q.y) < 1e-6;
    if (same(t.holes[t.holes.length - 1], b.holes[b.holes.length - 1])) b.holes.pop();
    if (same(t.holes[0], b.holes[0])) b.holes.shift();
  }
  return { rows, warnings };
}
