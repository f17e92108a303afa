/**
 * Walking a chain of outline primitives by arc length: points and travel directions at a
 * distance along a line or arc, where a vertical line x = X crosses a closed chain, and the
 * stretch of a closed chain between two such places. Exact for lines and circular arcs, so
 * stitch rows measured along curved ends need no sampling.
 */
import { primLength, primStart, type Prim, type Pt } from './prims.ts';

/** Part of one primitive, from `fromMm` to `toMm` of its own length (fromMm <= toMm). */
export interface PrimSpan {
  prim: Prim;
  fromMm: number;
  toMm: number;
}

/** Point `s` mm along a primitive, in its direction of travel. */
export function pointAlong(p: Prim, s: number): Pt {
  if (p.type === 'line') {
    const len = primLength(p);
    const f = len > 0 ? s / len : 0;
    return { x: p.a.x + f * (p.b.x - p.a.x), y: p.a.y + f * (p.b.y - p.a.y) };
  }
  const t = p.a0 + Math.sign(p.a1 - p.a0) * (s / p.r);
  return { x: p.c.x + p.r * Math.cos(t), y: p.c.y + p.r * Math.sin(t) };
}

/** Unit direction of travel `s` mm along a primitive. */
export function directionAlong(p: Prim, s: number): Pt {
  if (p.type === 'line') {
    const len = primLength(p) || 1;
    return { x: (p.b.x - p.a.x) / len, y: (p.b.y - p.a.y) / len };
  }
  const dir = Math.sign(p.a1 - p.a0) || 1;
  const t = p.a0 + dir * (s / p.r);
  return { x: -Math.sin(t) * dir, y: Math.cos(t) * dir };
}

/** Length (mm) of a span. */
export function spanLength(sp: PrimSpan): number {
  return sp.toMm - sp.fromMm;
}

/** A place on a closed chain: primitive index and distance along it (mm), and the point. */
export interface ChainPlace {
  index: number;
  atMm: number;
  pt: Pt;
}

/** Every place where the vertical line x = `x` meets the chain (a vertical segment on it gives both its ends). */
export function crossingsAtX(chain: readonly Prim[], x: number): ChainPlace[] {
  const out: ChainPlace[] = [];
  chain.forEach((p, index) => {
    const len = primLength(p);
    if (p.type === 'line') {
      const dx = p.b.x - p.a.x;
      if (Math.abs(dx) < 1e-12) {
        if (Math.abs(p.a.x - x) < 1e-9) out.push({ index, atMm: 0, pt: p.a }, { index, atMm: len, pt: p.b });
        return;
      }
      const f = (x - p.a.x) / dx;
      if (f >= -1e-12 && f <= 1 + 1e-12) out.push({ index, atMm: Math.min(Math.max(f, 0), 1) * len, pt: pointAlong(p, Math.min(Math.max(f, 0), 1) * len) });
      return;
    }
    const raw = (x - p.c.x) / p.r;
    // An arc's extreme point (a round end's apex) must still count when rounding puts it just past.
    if (raw < -1 - 1e-9 || raw > 1 + 1e-9) return;
    const c = Math.min(1, Math.max(-1, raw));
    const base = Math.acos(c);
    const lo = Math.min(p.a0, p.a1);
    const hi = Math.max(p.a0, p.a1);
    for (const t0 of [base, -base]) {
      for (let k = -2; k <= 2; k++) {
        const t = t0 + 2 * Math.PI * k;
        if (t < lo - 1e-12 || t > hi + 1e-12) continue;
        const s = Math.min(Math.max(Math.abs(t - p.a0) * p.r, 0), len);
        out.push({ index, atMm: s, pt: pointAlong(p, s) });
      }
    }
  });
  return out;
}

/** Smallest and largest x (mm) the chain reaches. */
export function chainXRange(chain: readonly Prim[]): { minX: number; maxX: number } {
  let minX = Infinity;
  let maxX = -Infinity;
  for (const p of chain) {
    const pts = [primStart(p), pointAlong(p, primLength(p))];
    if (p.type === 'arc') {
      // The arc's extreme x lies at an angle of 0 or pi when the sweep holds it.
      const lo = Math.min(p.a0, p.a1);
      const hi = Math.max(p.a0, p.a1);
      for (let k = -2; k <= 2; k++)
        for (const t of [2 * Math.PI * k, Math.PI + 2 * Math.PI * k]) if (t >= lo && t <= hi) pts.push({ x: p.c.x + p.r * Math.cos(t), y: p.c.y });
    }
    for (const q of pts) {
      minX = Math.min(minX, q.x);
      maxX = Math.max(maxX, q.x);
    }
  }
  return { minX, maxX };
}

/** The stretch of a closed chain going forward (clockwise) from place `a` to place `b`. */
export function chainStretch(chain: readonly Prim[], a: ChainPlace, b: ChainPlace): PrimSpan[] {
  const n = chain.length;
  if (a.index === b.index && b.atMm >= a.atMm) return [{ prim: chain[a.index]!, fromMm: a.atMm, toMm: b.atMm }];
  const out: PrimSpan[] = [{ prim: chain[a.index]!, fromMm: a.atMm, toMm: primLength(chain[a.index]!) }];
  for (let i = (a.index + 1) % n; i !== b.index; i = (i + 1) % n) out.push({ prim: chain[i]!, fromMm: 0, toMm: primLength(chain[i]!) });
  out.push({ prim: chain[b.index]!, fromMm: 0, toMm: b.atMm });
  return out.filter((sp) => spanLength(sp) > 1e-9);
}

/** The same stretch run the other way (a line's ends swapped, an arc's sweep reversed). */
export function reverseStretch(spans: readonly PrimSpan[]): PrimSpan[] {
  return [...spans].reverse().map((sp) => {
    const len = primLength(sp.prim);
    const prim: Prim = sp.prim.type === 'line' ? { type: 'line', a: sp.prim.b, b: sp.prim.a } : { ...sp.prim, a0: sp.prim.a1, a1: sp.prim.a0 };
    return { prim, fromMm: len - sp.toMm, toMm: len - sp.fromMm };
  });
}
