import { formatLength } from '@shared/units/format-length.ts';
import type { LengthUnit } from '@shared/units/length.ts';

export interface GrowthPoint {
  /** ISO 8601 time the girth was taken. */
  at: string;
  girthMm: number;
}

const W = 320;
const H = 140;
const PAD = { left: 44, right: 12, top: 12, bottom: 26 };

/**
 * A wearer's girth over time as a small inline line chart (growing puppies outgrow collars
 * in weeks). Plain SVG: a handful of points needs no chart library. Axis labels are in the
 * unit the shop reads; the table beside it carries the exact values for screen readers.
 */
export function GrowthChart({ points, unit, label }: { points: GrowthPoint[]; unit: LengthUnit; label: string }) {
  if (points.length < 2) return null;
  const sorted = [...points].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const times = sorted.map((p) => Date.parse(p.at));
  const girths = sorted.map((p) => p.girthMm);
  const t0 = Math.min(...times);
  const t1 = Math.max(...times);
  // Pad the girth range so a flat line sits mid-chart and the extremes keep off the edges.
  const spread = Math.max(...girths) - Math.min(...girths);
  const g0 = Math.min(...girths) - Math.max(spread * 0.15, 5);
  const g1 = Math.max(...girths) + Math.max(spread * 0.15, 5);
  const x = (t: number) => PAD.left + (t1 === t0 ? 0.5 : (t - t0) / (t1 - t0)) * (W - PAD.left - PAD.right);
  const y = (g: number) => PAD.top + (1 - (g - g0) / (g1 - g0)) * (H - PAD.top - PAD.bottom);
  const line = sorted.map((p, i) => `${i === 0 ? 'M' : 'L'}${x(times[i]!).toFixed(1)} ${y(p.girthMm).toFixed(1)}`).join(' ');
  const day = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short' });
  return (
    <figure className="m-0" data-testid="growth-chart">
      <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full max-w-md" role="img" aria-label={label}>
        <line x1={PAD.left} y1={H - PAD.bottom} x2={W - PAD.right} y2={H - PAD.bottom} stroke="var(--color-hide-300)" />
        <line x1={PAD.left} y1={PAD.top} x2={PAD.left} y2={H - PAD.bottom} stroke="var(--color-hide-300)" />
        {[g0 + (g1 - g0) * 0.15, g1 - (g1 - g0) * 0.15].map((g) => (
          <text key={g} x={PAD.left - 4} y={y(g) + 3} textAnchor="end" fontSize="9" fill="var(--color-hide-600)">
            {formatLength(g, unit)}
          </text>
        ))}
        <text x={PAD.left} y={H - 8} fontSize="9" fill="var(--color-hide-600)">
          {day.format(t0)}
        </text>
        <text x={W - PAD.right} y={H - 8} textAnchor="end" fontSize="9" fill="var(--color-hide-600)">
          {day.format(t1)}
        </text>
        <path d={line} fill="none" stroke="var(--color-hide-700)" strokeWidth="2" strokeLinejoin="round" />
        {sorted.map((p, i) => (
          <circle key={p.at + i} cx={x(times[i]!)} cy={y(p.girthMm)} r="3" fill="var(--color-brass-500)" />
        ))}
      </svg>
    </figure>
  );
}
