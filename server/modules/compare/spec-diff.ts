// Which spec parameters differ between two revisions, each with both values and its unit.

import type { ParamChange } from '@shared/schemas/library-views.ts';

export type { ParamChange };

type Leaves = Map<string, unknown>;

function flatten(value: unknown, prefix: string, out: Leaves): Leaves {
  if (Array.isArray(value)) {
    if (value.length === 0) out.set(prefix, []);
    value.forEach((v, i) => flatten(v, prefix ? `${prefix}.${i}` : String(i), out));
  } else if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.length === 0) out.set(prefix, {});
    for (const [k, v] of entries) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else out.set(prefix, value);
  return out;
}

/** The unit of a leaf: our specs name it in the key (girthMm, tolerancePct) or beside it (thickness). */
function unitOf(path: string, leaves: Leaves): string | null {
  const key = path.split('.').at(-1) ?? '';
  if (/Mm$/.test(key)) return 'mm';
  if (/Pct$/.test(key)) return '%';
  if (key === 'value') {
    const unit = leaves.get(`${path.slice(0, -'value'.length)}unit`);
    return typeof unit === 'string' ? unit : null;
  }
  return null;
}

/** Changed leaves between two specs, in the order they first appear. */
export function specChanges(from: unknown, to: unknown): ParamChange[] {
  const a = flatten(from, '', new Map());
  const b = flatten(to, '', new Map());
  const paths = [...new Set([...a.keys(), ...b.keys()])];
  const changes: ParamChange[] = [];
  for (const path of paths) {
    const x = a.get(path);
    const y = b.get(path);
    if (JSON.stringify(x) === JSON.stringify(y)) continue;
    changes.push({ path, from: x, to: y, unit: unitOf(path, b.has(path) ? b : a) });
  }
  return changes;
}
