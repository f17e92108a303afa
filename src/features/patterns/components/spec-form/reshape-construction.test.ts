import { describe, expect, it } from 'vitest';
import { computeLayout } from '@shared/pattern/index.ts';
import { presetSpec } from '@shared/pattern/presets/index.ts';
import { PieceSpecSchema, StitchRowSchema, StrapSpecSchema } from '@shared/schemas/strap-spec.ts';
import { newPiece, newStitchRow, newTaperStation } from './new-piece.ts';
import { reshapeConstruction } from './reshape-construction.ts';

describe('editor: pieces, ends, rows and stations the maker adds', () => {
  it.each(['keeper', 'bridge', 'fixed'] as const)('when a %s piece is added to the collar, then the spec still parses and lays out with one more piece', (kind) => {
    const spec = presetSpec('collar');
    spec.pieces.push(newPiece(kind, spec.pieces.map((p) => p.id)));
    const layout = computeLayout(StrapSpecSchema.parse(spec));
    expect(layout.pieces).toHaveLength(2);
  });

  it('when a new piece is parsed, then the schema adds nothing (the form would start dirty otherwise)', () => {
    for (const kind of ['keeper', 'bridge', 'fixed'] as const) {
      const p = newPiece(kind, []);
      expect(PieceSpecSchema.parse(p)).toEqual(p);
    }
  });

  it('when a second keeper is added, then its id differs from the first', () => {
    expect(newPiece('keeper', ['strap', 'keeper']).id).toBe('keeper-2');
  });

  it('when a stitch row and a taper station are added to the belt, then it lays out with the row and the narrower width', () => {
    const spec = presetSpec('belt');
    spec.pieces[0]!.stitchRows.push(StitchRowSchema.parse(newStitchRow(3.85, 3.175)));
    spec.pieces[0]!.taper.push({ ...newTaperStation(31.75, 300), from: 'start' });
    const layout = computeLayout(StrapSpecSchema.parse(spec));
    expect(layout.pieces[0]!.stitchRows.length).toBeGreaterThan(0);
    expect(layout.pieces[0]!.widthStations).toContainEqual({ atMm: 300, widthMm: 31.75 });
  });

  it.each(['fold-over', 'fold-back', 'plain', 'adjustable'] as const)('when the collar tip is rebuilt as %s, then the spec parses and keeps the English point', (next) => {
    const spec = presetSpec('collar');
    const tip = reshapeConstruction(spec.pieces[0]!.end, next, spec.widthMm);
    expect(tip.kind).toBe(next);
    expect(tip.shape).toEqual({ kind: 'english-point', depthMm: 19.05 });
    spec.pieces[0]!.end = tip;
    expect(StrapSpecSchema.safeParse(spec).success).toBe(true);
  });
});
