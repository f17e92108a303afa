import type { EndShape } from '@shared/schemas/strap-spec.ts';

/**
 * A new shape keeps what carries over (a point depth between English point and spear) and
 * otherwise starts from a value the engine draws for this width.
 */
export function reshapeEnd(current: EndShape | undefined, next: EndShape['kind'], widthMm: number): EndShape {
  const half = Math.round((widthMm / 2) * 1000) / 1000;
  const depth = current && 'depthMm' in current ? Math.max(current.depthMm, half) : Math.round(widthMm * 0.75 * 1000) / 1000;
  switch (next) {
    case 'square':
      return { kind: 'square' };
    case 'round':
      return { kind: 'round', radiusMm: half };
    case 'clipped':
      return { kind: 'clipped', chamferMm: Math.round((widthMm / 4) * 1000) / 1000 };
    case 'english-point':
      return { kind: 'english-point', depthMm: depth };
    case 'spear':
      return { kind: 'spear', depthMm: depth };
  }
}
