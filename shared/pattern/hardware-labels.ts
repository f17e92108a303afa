import { formatLength, formatLengthBare } from '../units/format-length.ts';
import type { HardwarePlacement } from './layout-types.ts';

/** Placements grouped by item, in the order they first appear. */
function byItem(rings: readonly HardwarePlacement[]): HardwarePlacement[][] {
  const groups = new Map<string, HardwarePlacement[]>();
  for (const r of rings) groups.set(r.item, [...(groups.get(r.item) ?? []), r]);
  return [...groups.values()];
}

/**
 * Notes above the strap for hardware that rides on it: D-rings beside a buckle share the fold
 * loop ("2 x D-ring in fold loop"); rings and clips a fold wraps are named at each fold.
 */
export function hardwareNotes(rings: readonly HardwarePlacement[]): { atMm: number; text: string }[] {
  return byItem(rings).flatMap((g) => {
    if (g[0]!.zoneMm[1] > g[0]!.zoneMm[0]) return [{ atMm: g.reduce((a, r) => a + r.atMm, 0) / g.length, text: `${g.length > 1 ? `${g.length} x ` : ''}${g[0]!.item} in fold loop` }];
    return g.map((r) => ({ atMm: r.atMm, text: `fold round ${r.item}` }));
  });
}

/** Caption lines: what each item is and where its bar lies (dashed on the drawing). */
export function hardwareCaptions(rings: readonly HardwarePlacement[], u: 'in' | 'mm'): string[] {
  return byItem(rings).map((g) => {
    const first = g[0]!;
    const n = g.length;
    const wire = first.wireDiameterMm > 0 ? `, ${formatLength(first.wireDiameterMm, u)} wire` : '';
    return `${first.item}${n > 1 ? 's' : ''}: ${n} x ${formatLength(first.insideWidthMm, u)} inside${wire}, ${first.note}; bar${n > 1 ? 's' : ''} at ${g.map((r) => formatLengthBare(r.atMm, u)).join(' and ')} (dashed).`;
  });
}
