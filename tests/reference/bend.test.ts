import { describe, expect, it } from 'vitest';
import { bendAllowanceMm, computeLayout, innerCircumferenceMm, presetSpec } from '@shared/pattern/index.ts';

describe('fold and loop geometry', () => {
  it("when bending 90° round R 3 mm with T 2 mm and K 0.33, then BA = 5.749 mm (Machinery's Handbook sheet-metal worked example)", () => {
    expect(bendAllowanceMm(Math.PI / 2, 3, 2, 0.33)).toBeCloseTo(5.749, 3);
  });

  it('when a ring of thickness T has a centreline of radius r, then the inner circumference is 2 pi (r - T/2) = centreline - pi T (circle geometry)', () => {
    for (const [r, T] of [[50, 4], [25.4, 3.96875], [10, 1]] as const) {
      expect(innerCircumferenceMm(2 * Math.PI * r, T)).toBeCloseTo(2 * Math.PI * (r - T / 2), 9);
    }
  });

  it('when the collar folds 180° round its 3 mm bar with K 0.5, then the layout reports BA = pi (1.5 + 0.5 T)', () => {
    const layout = computeLayout(presetSpec('collar'));
    const T = layout.thicknessMm;
    expect(layout.pieces[0]!.folds[0]!.bendAllowanceMm).toBeCloseTo(Math.PI * (1.5 + 0.5 * T), 9);
  });
});
