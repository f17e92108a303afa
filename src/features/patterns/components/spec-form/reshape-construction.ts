import type { EndSpec } from '@shared/schemas/strap-spec.ts';

/** How an end is built; `adjustable` only at the tip (the end away from the buckle). */
export type Construction = EndSpec['kind'];

/**
 * The end rebuilt as another construction, keeping its shape and starting the new one's
 * measures from the strap width (a fold 1 1/2 widths in, holes 3/4 in apart): values the
 * engine draws, which the maker then adjusts.
 */
export function reshapeConstruction(current: EndSpec, next: Construction, widthMm: number): EndSpec {
  if (current.kind === next) return current;
  const shape = current.shape ?? { kind: 'square' as const };
  const r = (x: number) => Math.round(x * 1000) / 1000;
  const holesOf = (e: EndSpec) => (e.kind === 'plain' ? e.holes : e.kind === 'fold-back' || e.kind === 'fold-over' ? e.flapHoles : []);
  switch (next) {
    case 'fold-over':
      return { kind: 'fold-over', foldAtMm: r(Math.max(10, widthMm * 1.5)), barDiameterMm: 3, slot: null, flapHoles: holesOf(current), bodyHoles: [], shape };
    case 'fold-back':
      return { kind: 'fold-back', loopInnerMm: r(Math.max(10, widthMm * 1.25)), overlapMm: r(Math.max(10, widthMm * 1.5)), flapHoles: holesOf(current), shape };
    case 'plain':
      return { kind: 'plain', holes: holesOf(current), shape };
    case 'adjustable':
      // Five holes 3/4 in apart, the third (counted from 1 at the buckle) the middle one.
      return { kind: 'adjustable', holes: { count: 5, spacingMm: 19.05, diameterMm: 4.7625, firstFromTipMm: r(Math.max(20, widthMm * 2.5)), middleHole: 3 }, shape };
  }
}
