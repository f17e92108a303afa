import type { StrapSpec } from '../schemas/strap-spec.ts';
import { formatLength } from '../units/format-length.ts';
import type { CutList, PieceLayout } from './layout-types.ts';

/** Rivet post length = leather stack + 2-3 mm to set (common practice); we take the middle. */
export const RIVET_SET_ALLOWANCE_MM = 2.5;

/**
 * Cut list: blanks, hardware, fasteners with post length from the stack each goes through,
 * punches by size (holes counted per piece copy), thread for all stitch rows.
 */
export function cutList(spec: StrapSpec, pieces: readonly PieceLayout[], t: number): CutList {
  const blanks = pieces.map((p) => ({ pieceId: p.id, name: p.name, count: p.count, lengthMm: p.blankLengthMm, widthMm: p.widthMm, thicknessMm: t }));
  const hardware: CutList['hardware'] = [];
  const hw = spec.hardware;
  const len = (mm: number) => formatLength(mm, spec.units);
  if (hw.buckle.style !== 'none') hardware.push({ item: `${hw.buckle.style} buckle`, count: 1, note: `inside width ${len(hw.buckle.insideWidthMm)}` });
  if (hw.dRings.count) hardware.push({ item: 'D-ring', count: hw.dRings.count, note: `inside width ${len(hw.dRings.insideWidthMm)}` });
  if (hw.clips?.count) hardware.push({ item: hw.clips.kind.replace('-', ' '), count: hw.clips.count, note: `eye inside width ${len(hw.clips.insideWidthMm)}` });
  const keeperPieces = pieces.filter((p) => p.role === 'accessory').reduce((s, p) => s + p.count, 0);
  if (hw.keepers > keeperPieces) hardware.push({ item: 'keeper (not cut here)', count: hw.keepers - keeperPieces });
  const fastenerMap = new Map<string, CutList['fasteners'][number]>();
  const punchMap = new Map<string, CutList['punches'][number]>();
  for (const p of pieces) {
    for (const f of p.features) {
      if (f.punch) {
        const e = punchMap.get(f.punch.size) ?? { size: f.punch.size, diameterMm: f.punch.diameterMm, holes: 0 };
        e.holes += p.count;
        punchMap.set(f.punch.size, e);
      }
      if (f.kind !== 'rivet' && f.kind !== 'screw' && f.kind !== 'snap') continue;
      // A flap hole and its partner take one fastener; count it at the flap (the lower x of the pair).
      if (f.partnerAtMm !== undefined && !f.onFlap) continue;
      const layers = f.layers ?? 1;
      const key = `${f.kind}:${layers}`;
      const e = fastenerMap.get(key) ?? { kind: f.kind, count: 0, layers, stackMm: layers * t, ...(f.kind === 'rivet' ? { postLengthMm: layers * t + RIVET_SET_ALLOWANCE_MM } : {}) };
      e.count += p.count;
      fastenerMap.set(key, e);
    }
  }
  const threadMm = pieces.reduce((s, p) => s + p.count * p.stitchRows.reduce((a, r) => a + r.threadMm, 0), 0);
  return {
    blanks,
    hardware,
    fasteners: [...fastenerMap.values()],
    punches: [...punchMap.values()].sort((a, b) => a.diameterMm - b.diameterMm),
    threadMm,
  };
}
