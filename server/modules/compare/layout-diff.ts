// How two Layouts differ, piece by piece: blank length, and features moved, added or removed.
// Features are matched by kind and label (then by order among equals); positions are mm
// from each piece's datum, so a move is a change of atMm or yMm.
import type { Feature, PatternLayout, PieceLayout } from '@shared/pattern/layout-types.ts';
import type { FeatureRef, LayoutDiff, MovedFeature, PieceDiff } from '@shared/schemas/library-views.ts';

/** Smaller changes than this (mm) are rounding, not a move. */
export const MOVE_TOLERANCE_MM = 0.005;

export type { FeatureRef, LayoutDiff, MovedFeature, PieceDiff };

const ref = (f: Feature): FeatureRef => ({ kind: f.kind, label: f.label, atMm: f.atMm, yMm: f.yMm });

function keyed(features: readonly Feature[]): Map<string, Feature> {
  const seen = new Map<string, number>();
  const out = new Map<string, Feature>();
  for (const f of features) {
    const base = `${f.kind}|${f.label}`;
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    out.set(`${base}|${n}`, f);
  }
  return out;
}

function pieceDiff(a: PieceLayout | undefined, b: PieceLayout | undefined): PieceDiff | null {
  const piece = (b ?? a)!;
  const fa = keyed(a?.features ?? []);
  const fb = keyed(b?.features ?? []);
  const moved: MovedFeature[] = [];
  const added: FeatureRef[] = [];
  const removed: FeatureRef[] = [];
  for (const [k, f] of fb) {
    const old = fa.get(k);
    if (!old) added.push(ref(f));
    else if (Math.abs(old.atMm - f.atMm) > MOVE_TOLERANCE_MM || Math.abs(old.yMm - f.yMm) > MOVE_TOLERANCE_MM) {
      moved.push({ kind: f.kind, label: f.label, from: { atMm: old.atMm, yMm: old.yMm }, to: { atMm: f.atMm, yMm: f.yMm }, deltaAtMm: f.atMm - old.atMm });
    }
  }
  for (const [k, f] of fa) if (!fb.has(k)) removed.push(ref(f));
  const from = a?.blankLengthMm ?? null;
  const to = b?.blankLengthMm ?? null;
  const lengthChanged = from === null || to === null || Math.abs(from - to) > MOVE_TOLERANCE_MM;
  if (a && b && !lengthChanged && moved.length + added.length + removed.length === 0) return null;
  return {
    pieceId: piece.id,
    name: piece.name,
    status: !a ? 'added' : !b ? 'removed' : 'changed',
    blankLengthMm: { from, to, deltaMm: from !== null && to !== null ? to - from : null },
    moved,
    added,
    removed,
  };
}

/** Differences from layout `a` to layout `b` (pieces matched by id). */
export function layoutDiff(a: PatternLayout, b: PatternLayout): LayoutDiff {
  const ids = [...new Set([...a.pieces.map((p) => p.id), ...b.pieces.map((p) => p.id)])];
  const pieces = ids
    .map((id) => pieceDiff(a.pieces.find((p) => p.id === id), b.pieces.find((p) => p.id === id)))
    .filter((d): d is PieceDiff => d !== null);
  const wa = new Set(a.warnings.map((w) => w.message));
  const wb = new Set(b.warnings.map((w) => w.message));
  return {
    unit: 'mm',
    targetMm: { from: a.targetMm, to: b.targetMm },
    fitRangeMm: { from: a.fit?.rangeMm ?? null, to: b.fit?.rangeMm ?? null },
    pieces,
    warnings: { added: [...wb].filter((m) => !wa.has(m)), removed: [...wa].filter((m) => !wb.has(m)) },
  };
}
