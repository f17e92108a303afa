import type { EndSpec, PieceSpec, StitchRowSchema, TaperStationSchema } from '@shared/schemas/strap-spec.ts';
import type { z } from 'zod';

/** Kinds of piece a maker adds beside the strap. */
export type NewPieceKind = 'keeper' | 'bridge' | 'fixed';

const plain = (): EndSpec => ({ kind: 'plain', holes: [], shape: { kind: 'square' } });

/** A piece id no other piece has: "keeper", "keeper-2", ... */
export function freshPieceId(base: string, taken: readonly string[]): string {
  if (!taken.includes(base)) return base;
  let n = 2;
  while (taken.includes(`${base}-${n}`)) n += 1;
  return `${base}-${n}`;
}

/**
 * A new piece with every field the form shows, so adding it and removing it again leaves the
 * form as it was. A keeper wraps the strap's layers (3/8 in wide, common practice); a second
 * strap half (a watch strap's short piece) folds round a bar at both ends; a fixed piece is a
 * plain blank of a given length.
 */
export function newPiece(kind: NewPieceKind, taken: readonly string[]): PieceSpec {
  const base = { count: 1, taper: [], stitchRows: [] };
  switch (kind) {
    case 'keeper':
      return { ...base, id: freshPieceId('keeper', taken), name: 'Keeper', role: 'accessory', length: { kind: 'keeper', layers: 2, easeMm: 2, overlapMm: 0 }, widthMm: 9.525, start: plain(), end: plain() };
    case 'bridge': {
      const lug: EndSpec = { kind: 'fold-over', foldAtMm: 15, barDiameterMm: 2, slot: null, flapHoles: [], bodyHoles: [], shape: { kind: 'square' } };
      return { ...base, id: freshPieceId('short', taken), name: 'Short piece', role: 'bridge', length: { kind: 'fixed', blankMm: 100 }, start: lug, end: { ...lug } };
    }
    case 'fixed':
      return { ...base, id: freshPieceId('piece', taken), name: 'Extra piece', role: 'accessory', length: { kind: 'fixed', blankMm: 100 }, start: plain(), end: plain() };
  }
}

/** A stitch row along both edges, 1 in in from each end, on the shop's iron and edge guide. */
export function newStitchRow(pitchMm: number, edgeGuideMm: number): z.input<typeof StitchRowSchema> {
  return { path: 'both-edges', fromMm: 25.4, fromRef: 'start', toMm: 25.4, toRef: 'end', offsetMm: Math.max(1, edgeGuideMm), pitchMm, tolerancePct: 5 };
}

/** A width station: the piece narrows (or widens) to `widthMm` this far from its start. */
export function newTaperStation(widthMm: number, atMm: number): z.input<typeof TaperStationSchema> {
  return { atMm, from: 'start', widthMm };
}
