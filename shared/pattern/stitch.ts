import type { PieceSpec } from '../schemas/strap-spec.ts';
import { EngineError } from './engine-error.ts';
import type { StitchRowLayout, Warning } from './layout-types.ts';
import type { Pt } from './prims.ts';
import type { WidthProfile } from './width-profile.ts';

/** Saddle stitch uses about four times the seam length of thread (common practice). */
export const THREAD_PER_SEAM = 4;
/** A bend sharper than this (degrees) is a corner: a hole always lands on it. */
const CORNER_DEG = 15;

type Row = PieceSpec['stitchRows'][number];

/** The edge offset inward by `d` at x, following the taper (perpendicular offset), y sign per edge. */
function edgeRow(profile: WidthProfile, x0: number, x1: number, d: number, sign: -1 | 1): Pt[] {
  const xs = [x0, ...profile.stations.map((s) => s.atMm).filter((x) => x > x0 + 1e-6 && x < x1 - 1e-6), x1];
  // For a slanted edge y = a + m x, a line d inside it is shifted by d x sqrt(1 + m²) across.
  const yAt = (xa: number, xb: number, x: number) => {
    const wa = profile.at(xa), wb = profile.at(xb);
    const m = xb > xa ? (wb - wa) / 2 / (xb - xa) : 0;
    return sign * (profile.at(x) / 2 - d * Math.sqrt(1 + m * m));
  };
  const pts: Pt[] = [];
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i]!;
    const before = i > 0 ? yAt(xs[i - 1]!, x, x) : undefined;
    const after = i < xs.length - 1 ? yAt(x, xs[i + 1]!, x) : undefined;
    // At an inner station both offset lines pass near x; their mean is within the iron's tolerance.
    const y = before !== undefined && after !== undefined ? (before + after) / 2 : (before ?? after)!;
    pts.push({ x, y });
  }
  return pts;
}

function turnDeg(a: Pt, b: Pt, c: Pt): number {
  const t1 = Math.atan2(b.y - a.y, b.x - a.x);
  const t2 = Math.atan2(c.y - b.y, c.x - b.x);
  let d = Math.abs(t2 - t1) % (2 * Math.PI);
  if (d > Math.PI) d = 2 * Math.PI - d;
  return (d * 180) / Math.PI;
}

/** Holes at an even pitch along one polyline run, landing on both ends. */
function runHoles(run: Pt[], pitchMm: number): { holes: Pt[]; lengthMm: number; adjustedMm: number } {
  const segs = run.slice(1).map((p, i) => Math.hypot(p.x - run[i]!.x, p.y - run[i]!.y));
  const lengthMm = segs.reduce((s, v) => s + v, 0);
  const n = Math.max(1, Math.round(lengthMm / pitchMm));
  const adjustedMm = lengthMm / n;
  const holes: Pt[] = [];
  let seg = 0;
  let segStart = 0;
  for (let i = 0; i <= n; i++) {
    const s = i === n ? lengthMm : i * adjustedMm;
    while (seg < segs.length - 1 && s > segStart + segs[seg]!) segStart += segs[seg++]!;
    const a = run[seg]!, b = run[seg + 1]!;
    const f = segs[seg]! > 0 ? Math.min(1, (s - segStart) / segs[seg]!) : 0;
    holes.push({ x: a.x + f * (b.x - a.x), y: a.y + f * (b.y - a.y) });
  }
  return { holes, lengthMm, adjustedMm };
}

/**
 * Lays out one stitch row: the polyline(s) it follows, split at corners; on each run the
 * pitch is stretched or shrunk so holes land at both ends of the run; a warning when the
 * change exceeds the row's tolerance.
 */
export function layoutStitchRow(row: Row, profile: WidthProfile, lengthMm: number, field: string, pieceId: string): { rows: StitchRowLayout[]; warnings: Warning[] } {
  const x0 = row.fromRef === 'start' ? row.fromMm : lengthMm - row.fromMm;
  const x1 = row.toRef === 'start' ? row.toMm : lengthMm - row.toMm;
  if (!(x1 - x0 > row.pitchMm)) throw new EngineError(`${field}.toMm`, `stitch row runs from ${x0.toFixed(1)} to ${x1.toFixed(1)} mm: it must end at least one pitch after it starts`, `end after ${(x0 + row.pitchMm).toFixed(1)} mm`);
  if (x0 < profile.x0 - 1e-6 || x1 > profile.x1 + 1e-6) throw new EngineError(`${field}.fromMm`, `stitch row ${x0.toFixed(1)}-${x1.toFixed(1)} mm leaves the straight edges (${profile.x0.toFixed(1)}-${profile.x1.toFixed(1)} mm)`, `within ${profile.x0.toFixed(1)}-${profile.x1.toFixed(1)} mm`);
  if (row.offsetMm * 2 >= Math.min(profile.at(x0), profile.at(x1))) throw new EngineError(`${field}.offsetMm`, `stitch offset ${row.offsetMm} mm meets the other edge`, `less than half the width`);
  const top = edgeRow(profile, x0, x1, row.offsetMm, -1);
  const bottom = edgeRow(profile, x0, x1, row.offsetMm, 1);
  const lines: Pt[][] =
    row.path === 'both-edges' ? [top, bottom]
    : row.path === 'top-edge' ? [top]
    : row.path === 'bottom-edge' ? [bottom]
    : row.path === 'around-start' ? [[...top].reverse().concat(bottom)]
    : [top.concat([...bottom].reverse())];
  const rows: StitchRowLayout[] = [];
  const warnings: Warning[] = [];
  for (const pts of lines) {
    const runs: Pt[][] = [[pts[0]!]];
    for (let i = 1; i < pts.length; i++) {
      runs[runs.length - 1]!.push(pts[i]!);
      if (i < pts.length - 1 && turnDeg(pts[i - 1]!, pts[i]!, pts[i + 1]!) > CORNER_DEG) runs.push([pts[i]!]);
    }
    const holes: Pt[] = [];
    let seam = 0;
    let worst = row.pitchMm;
    for (const run of runs) {
      const r = runHoles(run, row.pitchMm);
      holes.push(...(holes.length ? r.holes.slice(1) : r.holes));
      seam += r.lengthMm;
      if (Math.abs(r.adjustedMm - row.pitchMm) > Math.abs(worst - row.pitchMm)) worst = r.adjustedMm;
    }
    const offPct = (Math.abs(worst - row.pitchMm) / row.pitchMm) * 100;
    if (offPct > row.tolerancePct + 1e-9)
      warnings.push({ code: 'stitch-pitch-off', pieceId, message: `stitch row ${field}: pitch ${row.pitchMm} mm had to become ${worst.toFixed(2)} mm (${offPct.toFixed(1)} %, tolerance ${row.tolerancePct} %)` });
    rows.push({ points: pts, holes, pitchMm: row.pitchMm, adjustedPitchMm: worst, seamLengthMm: seam, threadMm: THREAD_PER_SEAM * seam });
  }
  return { rows, warnings };
}
