/**
 * Specs saved before tip holes were numbered from 1 hold `nominalIndex` (the middle hole
 * counted from 0). Revisions are never rewritten, so such specs are read as `middleHole =
 * nominalIndex + 1` wherever a stored spec is used: the schema on parse (pattern files,
 * requests), and upgradeSpec for specs read straight from the database.
 */
import type { StrapSpec } from './strap-spec.ts';

interface LegacyHoles {
  count: number;
  middleHole?: number;
  nominalIndex?: number;
}

/** True when some adjustable end has no `middleHole` yet. */
function needsUpgrade(spec: StrapSpec): boolean {
  return (spec.pieces ?? []).some((p) => [p.start, p.end].some((e) => e?.kind === 'adjustable' && (e.holes as LegacyHoles).middleHole === undefined));
}

/** The holes with `middleHole` (from `nominalIndex + 1`, else the middle of the row) and no `nominalIndex`. */
function upgradeHoles(h: LegacyHoles): LegacyHoles {
  const { nominalIndex, middleHole, ...rest } = h;
  return { ...rest, middleHole: middleHole ?? (typeof nominalIndex === 'number' ? nominalIndex + 1 : Math.ceil(h.count / 2)) };
}

/**
 * A stored spec in today's shape. Returns the same object when nothing needs upgrading (the
 * common case costs one scan of the pieces); never changes its argument.
 */
export function upgradeSpec<T extends StrapSpec>(spec: T): T {
  if (!needsUpgrade(spec)) return spec;
  const end = <E extends StrapSpec['pieces'][number]['end']>(e: E): E => (e.kind === 'adjustable' ? { ...e, holes: upgradeHoles(e.holes as LegacyHoles) } : e);
  return { ...spec, pieces: spec.pieces.map((p) => ({ ...p, start: end(p.start), end: end(p.end) })) };
}
