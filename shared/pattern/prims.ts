/**
 * Outline primitives: straight lines and circular arcs in mm (piece frame, +y down).
 * Arcs keep the geometry exact for lengths, areas and offsets; they are turned into cubic
 * Béziers only when drawn (see {@link primsToCommands}).
 */
import type { PathCommand } from '../render/drawing.ts';

/** A point in mm. */
export interface Pt {
  x: number;
  y: number;
}
/** A straight segment from `a` to `b`. */
export interface LinePrim {
  type: 'line';
  a: Pt;
  b: Pt;
}
/** A circular arc round `c` of radius `r` from angle `a0` to `a1` (radians; increasing = clockwise on screen). */
export interface ArcPrim {
  type: 'arc';
  c: Pt;
  r: number;
  a0: number;
  a1: number;
}
/** One outline primitive. */
export type Prim = LinePrim | ArcPrim;

/** Start point of a primitive. */
export function primStart(p: Prim): Pt {
  return p.type === 'line' ? p.a : { x: p.c.x + p.r * Math.cos(p.a0), y: p.c.y + p.r * Math.sin(p.a0) };
}
/** End point of a primitive. */
export function primEnd(p: Prim): Pt {
  return p.type === 'line' ? p.b : { x: p.c.x + p.r * Math.cos(p.a1), y: p.c.y + p.r * Math.sin(p.a1) };
}
/** Length of a primitive in mm (exact for arcs: r x sweep). */
export function primLength(p: Prim): number {
  return p.type === 'line' ? Math.hypot(p.b.x - p.a.x, p.b.y - p.a.y) : p.r * Math.abs(p.a1 - p.a0);
}
/** The same primitive traversed the other way. */
export function reversePrim(p: Prim): Prim {
  return p.type === 'line' ? { type: 'line', a: p.b, b: p.a } : { ...p, a0: p.a1, a1: p.a0 };
}
/** Mirror in the vertical line x = `x0`. */
export function mirrorPrimX(p: Prim, x0: number): Prim {
  const m = (q: Pt): Pt => ({ x: 2 * x0 - q.x, y: q.y });
  return p.type === 'line' ? { type: 'line', a: m(p.a), b: m(p.b) } : { ...p, c: m(p.c), a0: Math.PI - p.a0, a1: Math.PI - p.a1 };
}
/** Shift by (dx, dy). */
export function translatePrim(p: Prim, dx: number, dy: number): Prim {
  const t = (q: Pt): Pt => ({ x: q.x + dx, y: q.y + dy });
  return p.type === 'line' ? { type: 'line', a: t(p.a), b: t(p.b) } : { ...p, c: t(p.c) };
}

/** Total length (mm) of a chain of primitives. */
export function chainLength(prims: readonly Prim[]): number {
  return prims.reduce((s, p) => s + primLength(p), 0);
}

/**
 * Signed area (mm²) enclosed by a closed chain, by Green's theorem: ½∮(x dy - y dx).
 * Lines give ½(x0 y1 - x1 y0); an arc gives ½[r²Δt + r cx (sin t1 - sin t0) - r cy (cos t1 - cos t0)].
 * Positive for a clockwise-on-screen (y down) chain.
 */
export function chainArea(prims: readonly Prim[]): number {
  let twice = 0;
  for (const p of prims) {
    if (p.type === 'line') twice += p.a.x * p.b.y - p.b.x * p.a.y;
    else {
      const { c, r, a0, a1 } = p;
      twice += r * r * (a1 - a0) + r * c.x * (Math.sin(a1) - Math.sin(a0)) - r * c.y * (Math.cos(a1) - Math.cos(a0));
    }
  }
  return twice / 2;
}

/**
 * Path commands for a chain: M, then L per line and one C per arc piece of at most 90°
 * (control distance 4/3 tan(θ/4) x r, the standard circular approximation, error < 0.03 % of r).
 */
export function primsToCommands(prims: readonly Prim[], close: boolean): PathCommand[] {
  const first = prims[0];
  if (!first) return [];
  const s = primStart(first);
  const out: PathCommand[] = [{ op: 'M', x: s.x, y: s.y }];
  for (const p of prims) {
    if (p.type === 'line') {
      out.push({ op: 'L', x: p.b.x, y: p.b.y });
      continue;
    }
    const sweep = p.a1 - p.a0;
    const n = Math.max(1, Math.ceil(Math.abs(sweep) / (Math.PI / 2) - 1e-9));
    const d = sweep / n;
    const k = (4 / 3) * Math.tan(d / 4) * p.r;
    for (let i = 0; i < n; i++) {
      const t0 = p.a0 + i * d;
      const t1 = t0 + d;
      const x0 = p.c.x + p.r * Math.cos(t0);
      const y0 = p.c.y + p.r * Math.sin(t0);
      const x3 = p.c.x + p.r * Math.cos(t1);
      const y3 = p.c.y + p.r * Math.sin(t1);
      out.push({
        op: 'C',
        x1: x0 - k * Math.sin(t0),
        y1: y0 + k * Math.cos(t0),
        x2: x3 + k * Math.sin(t1),
        y2: y3 - k * Math.cos(t1),
        x: x3,
        y: y3,
      });
    }
  }
  if (close) out.push({ op: 'Z' });
  return out;
}
