import { primEnd, primStart, type Prim, type Pt } from './prims.ts';

const EPS = 1e-7;

/** Offset a primitive `d` mm to the inside of a clockwise (y down) chain; null if it vanishes. */
function offsetPrim(p: Prim, d: number): Prim | null {
  if (p.type === 'line') {
    const dx = p.b.x - p.a.x;
    const dy = p.b.y - p.a.y;
    const len = Math.hypot(dx, dy);
    if (len < EPS) return null;
    // Inside of a clockwise-on-screen chain is to the right of travel: n = (-dy, dx) / len.
    const nx = (-dy / len) * d;
    const ny = (dx / len) * d;
    return { type: 'line', a: { x: p.a.x + nx, y: p.a.y + ny }, b: { x: p.b.x + nx, y: p.b.y + ny } };
  }
  // A convex arc (sweeping clockwise) shrinks; a concave one grows.
  const r = p.a1 > p.a0 ? p.r - d : p.r + d;
  return r > EPS ? { ...p, r } : null;
}

function lineLine(a: Prim & { type: 'line' }, b: Prim & { type: 'line' }): Pt | null {
  const d1x = a.b.x - a.a.x, d1y = a.b.y - a.a.y;
  const d2x = b.b.x - b.a.x, d2y = b.b.y - b.a.y;
  const den = d1x * d2y - d1y * d2x;
  if (Math.abs(den) < EPS) return null;
  const t = ((b.a.x - a.a.x) * d2y - (b.a.y - a.a.y) * d2x) / den;
  return { x: a.a.x + t * d1x, y: a.a.y + t * d1y };
}

function circleOf(p: Prim): { c: Pt; r: number } | null {
  return p.type === 'arc' ? { c: p.c, r: p.r } : null;
}

/** Intersections of a line (infinite) with a circle. */
function lineCircle(l: Prim & { type: 'line' }, c: Pt, r: number): Pt[] {
  const dx = l.b.x - l.a.x, dy = l.b.y - l.a.y;
  const fx = l.a.x - c.x, fy = l.a.y - c.y;
  const A = dx * dx + dy * dy, B = 2 * (fx * dx + fy * dy), C = fx * fx + fy * fy - r * r;
  const disc = B * B - 4 * A * C;
  if (disc < 0) return [];
  const s = Math.sqrt(disc);
  return [(-B - s) / (2 * A), (-B + s) / (2 * A)].map((t) => ({ x: l.a.x + t * dx, y: l.a.y + t * dy }));
}

function circleCircle(c1: Pt, r1: number, c2: Pt, r2: number): Pt[] {
  const dx = c2.x - c1.x, dy = c2.y - c1.y;
  const d = Math.hypot(dx, dy);
  if (d < EPS || d > r1 + r2 || d < Math.abs(r1 - r2)) return [];
  const a = (r1 * r1 - r2 * r2 + d * d) / (2 * d);
  const h = Math.sqrt(Math.max(0, r1 * r1 - a * a));
  const mx = c1.x + (a * dx) / d, my = c1.y + (a * dy) / d;
  return [
    { x: mx + (h * -dy) / d, y: my + (h * dx) / d },
    { x: mx - (h * -dy) / d, y: my - (h * dx) / d },
  ];
}

function meet(p: Prim, q: Prim, near: Pt): Pt | null {
  let cands: Pt[] = [];
  const cp = circleOf(p), cq = circleOf(q);
  if (p.type === 'line' && q.type === 'line') {
    const x = lineLine(p, q);
    cands = x ? [x] : [];
  } else if (p.type === 'line' && cq) cands = lineCircle(p, cq.c, cq.r);
  else if (cp && q.type === 'line') cands = lineCircle(q, cp.c, cp.r);
  else if (cp && cq) cands = circleCircle(cp.c, cp.r, cq.c, cq.r);
  let best: Pt | null = null;
  let bestD = Infinity;
  for (const c of cands) {
    const dd = Math.hypot(c.x - near.x, c.y - near.y);
    if (dd < bestD) [best, bestD] = [c, dd];
  }
  return best;
}

function setStart(p: Prim, s: Pt): Prim {
  return p.type === 'line' ? { ...p, a: s } : { ...p, a0: unwrapNear(Math.atan2(s.y - p.c.y, s.x - p.c.x), p.a0) };
}
function setEnd(p: Prim, e: Pt): Prim {
  return p.type === 'line' ? { ...p, b: e } : { ...p, a1: unwrapNear(Math.atan2(e.y - p.c.y, e.x - p.c.x), p.a1) };
}
function unwrapNear(a: number, ref: number): number {
  let v = a;
  while (v - ref > Math.PI) v -= 2 * Math.PI;
  while (ref - v > Math.PI) v += 2 * Math.PI;
  return v;
}

/** True when trimming turned a primitive round (a chamfer or corner shorter than the offset). */
function flipped(orig: Prim, off: Prim): boolean {
  if (orig.type === 'line' && off.type === 'line') return (off.b.x - off.a.x) * (orig.b.x - orig.a.x) + (off.b.y - off.a.y) * (orig.b.y - orig.a.y) <= 0;
  if (orig.type === 'arc' && off.type === 'arc') return (off.a1 - off.a0) * (orig.a1 - orig.a0) <= 0;
  return false;
}

function joinNeighbours(src: readonly { orig: Prim; off: Prim }[]): Prim[] {
  const out = src.map((e) => e.off);
  const n = out.length;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const p = out[i]!;
    const q = out[j]!;
    const pe = primEnd(p);
    const qs = primStart(q);
    if (Math.hypot(pe.x - qs.x, pe.y - qs.y) < 1e-6) continue;
    const x = meet(p, q, primEnd(src[i]!.orig));
    if (!x) continue;
    out[i] = setEnd(p, x);
    out[j] = setStart(q, x);
  }
  return out;
}

/**
 * Inset a closed clockwise chain by `d` mm (the edge guide a wing divider scribes, the line a
 * stitch row follows). Lines move along their normal, arcs keep their centre and change
 * radius (exact offsets); where neighbours no longer meet they are trimmed or extended to
 * their intersection. A primitive that trimming turns round (a chamfer or a small corner
 * radius shorter than the offset) has no part in the offset: it is dropped and its
 * neighbours joined directly.
 */
export function insetChain(prims: readonly Prim[], d: number): Prim[] {
  let src = prims.map((p) => ({ orig: p, off: offsetPrim(p, d) })).filter((e) => e.off !== null) as { orig: Prim; off: Prim }[];
  for (;;) {
    const out = joinNeighbours(src);
    const bad = out.findIndex((p, i) => flipped(src[i]!.orig, p));
    if (bad < 0 || src.length <= 3) return out;
    src = src.filter((_, i) => i !== bad);
  }
}
