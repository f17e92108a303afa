import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { svgNumber } from './svg-style.ts';
import { inToMm } from '../units/length.ts';

describe('svgNumber', () => {
  it('when a value and its negative are written, then both round to the same magnitude', () => {
    // 3/8 in = 9.525 mm exactly (1959 inch); half of it sits on a rounding half at 0.001 mm.
    const half = inToMm(3 / 8) / 2;
    expect(svgNumber(half)).toBe('4.763');
    expect(svgNumber(-half)).toBe('-4.763');
    expect(svgNumber(-0.0001)).toBe('0.000');
  });

  it('when inches are converted, then binary noise is gone (1 1/2 in = 38.1 mm exactly, 1959 agreement)', () => {
    expect(inToMm(1.5)).toBe(38.1);
    expect(inToMm(0.75)).toBe(19.05);
  });
});

describe('svgNumber near a half', () => {
  it('when the same half arrives with opposite float noise, then both edges print alike', () => {
    expect(svgNumber(2.7625 - 1e-12)).toBe('2.763');
    expect(svgNumber(-(2.7625 + 1e-12))).toBe('-2.763');
    expect(svgNumber(-(2.7625 - 1e-12))).toBe('-2.763');
  });
});

describe('svgNumber against toFixed', () => {
  // The first way it was written: round via the micrometre, then Number.prototype.toFixed(3).
  const viaToFixed = (v: number) => {
    const s = ((Math.sign(v) * Math.round(Math.round(Math.abs(v) * 1e6) / 1000)) / 1000).toFixed(3);
    return s === '-0.000' ? '0.000' : s;
  };

  it('when any number is written, then the text is what toFixed(3) gives (ECMAScript Number.prototype.toFixed)', () => {
    const halves = fc.integer({ min: -2_000_000, max: 2_000_000 }).map((i) => i / 2000);
    fc.assert(
      fc.property(fc.oneof(fc.double(), fc.double({ min: -5000, max: 5000 }), halves, fc.constantFrom(0, -0, 0.0005, -0.0005, 0.9995, 999.9995, 1e12, -1e15, NaN, Infinity, -Infinity)), (v) => {
        expect(svgNumber(v)).toBe(viaToFixed(v));
      }),
      { numRuns: 20_000, seed: 20261203 },
    );
  });
});
