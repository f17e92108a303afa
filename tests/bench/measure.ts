// Timing helpers shared by the benchmarks. Rates are taken both per wall-clock second and per
// CPU second of this process (process.cpuUsage): on a shared machine the wall clock also counts
// the time other processes ran, while CPU time is what "per core" means.
import os from 'node:os';

/** Operations per wall-clock second and per CPU second, each the median of several windows. */
export interface Rate {
  perWallS: number;
  perCpuS: number;
}

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? NaN;
};

/** Calls per CPU second of `fn` over about `ms` of wall time. */
function cpuWindow(fn: () => unknown, ms: number): number {
  let n = 0;
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  while (performance.now() - t0 < ms) {
    for (let i = 0; i < 5; i++) fn();
    n += 5;
  }
  const c = process.cpuUsage(c0);
  return (n * 1e6) / Math.max(1, c.user + c.system);
}

/**
 * Runs `fn` for a warm-up, then in `windows` windows of about `ms / windows` each; returns the
 * median rates. The warm-up lasts at least `warmMs` and until two windows in a row agree within
 * 15 % (at most 8 s): V8 optimises hot code on background threads, and on a loaded machine
 * those threads wait, so a fixed short warm-up measured the unoptimised code (a collar layout
 * read 1,300/s after 0.25 s and 4,700/s after 3 s of warm-up in one loaded run).
 */
export function rate(fn: () => unknown, ms = 600, windows = 5, warmMs = 2000): Rate {
  // A clean heap first, then the warm-up. A forced full collection just before the timed
  // windows cost the next half second V8's re-optimisation: the collar SVG read 1,963 per CPU s
  // right after gc() and 4,242 with the same code once warm again (back to back, quiet machine).
  (globalThis as { gc?: () => void }).gc?.();
  const w0 = performance.now();
  for (let i = 0; i < 20; i++) fn();
  let last = cpuWindow(fn, 150);
  for (;;) {
    const next = cpuWindow(fn, 150);
    const settled = Math.abs(next - last) <= 0.15 * Math.max(next, last);
    last = next;
    const elapsed = performance.now() - w0;
    if ((settled && elapsed >= warmMs) || elapsed >= 8000) break;
  }
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let w = 0; w < windows; w++) {
    let n = 0;
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    let t = t0;
    while (t - t0 < ms / windows) {
      for (let i = 0; i < 5; i++) fn();
      n += 5;
      t = performance.now();
    }
    const c = process.cpuUsage(c0);
    wall.push((n * 1000) / (t - t0));
    cpu.push((n * 1e6) / Math.max(1, c.user + c.system));
  }
  return { perWallS: median(wall), perCpuS: median(cpu) };
}

/** Median wall time of `fn` in ms over `runs` runs after `warm` warm-up runs. */
export async function medianMs(fn: () => unknown, runs = 7, warm = 2): Promise<number> {
  for (let i = 0; i < warm; i++) await fn();
  const t: number[] = [];
  // No forced collection between runs: it left each run to re-optimise what it discarded (see
  // rate()); the median keeps an odd collection pause out of the figure.
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    await fn();
    t.push(performance.now() - s);
  }
  return median(t);
}

/** A number for a table: no decimals from 100 up, one below. */
export const num = (v: number, width = 8): string => (v >= 100 ? v.toFixed(0) : v.toFixed(1)).padStart(width);

/** "ok" or "MISSED" for a target. */
export const verdict = (ok: boolean): string => (ok ? 'ok' : 'MISSED');

/** The machine and how busy it was, printed above each table (figures depend on both). */
export function machineLine(): string {
  const cpus = os.cpus();
  const load = os.loadavg().map((l) => l.toFixed(1)).join(' ');
  return `${new Date().toISOString().slice(0, 16)}Z · ${cpus.length} cores · ${cpus[0]?.model.trim() ?? 'unknown CPU'} · Node ${process.version} · load average ${load}`;
}

/**
 * Calls `fn` for at least `ms` of wall time (and at least `min` times), to warm the JIT as a
 * long-running server is warm. A fixed count of 8 warm-ups left a template PDF timed at about
 * twice its warm time on a busy machine: V8 optimises on background threads that wait there.
 */
export async function warmFor(fn: () => unknown, ms = 2000, min = 8): Promise<void> {
  const t0 = performance.now();
  for (let i = 0; i < min || performance.now() - t0 < ms; i++) await fn();
}
