import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { areaBetweenPolylines } from '../../../src/core/geometry/areaBetweenPolylines';
import { shoelaceArea } from '../../../src/core/geometry/shoelaceArea';
import { expectClose } from '../../expectClose';

describe('areaBetweenPolylines(a, b)', () => {
  it('is the trapezoid area of a box fold over a flat regional', () => {
    // Analytic: trapezoid with parallel sides 40 and 60, height 100: (40 + 60)/2 · 100 = 5000.
    expect(areaBetweenPolylines([0, 20, 30, 70, 80, 100], [0, 0, 100, 100, 0, 0], [0, 100], [0, 0])).toBe(5000);
  });

  it('is negative when the line lies below the other', () => {
    expect(areaBetweenPolylines([0, 50, 100], [0, -100, 0], [0, 100], [0, 0])).toBe(-5000);
  });

  it('equals minus the shoelace area of the closed loop a-forward, b-back (property)', () => {
    const z = fc.double({ min: -500, max: 500, noNaN: true });
    fc.assert(fc.property(fc.array(z, { minLength: 2, maxLength: 20 }), fc.array(z, { minLength: 2, maxLength: 5 }), (az, bz) => {
      const ax = az.map((_, i) => (100 * i) / (az.length - 1));
      const bx = bz.map((_, i) => (100 * i) / (bz.length - 1));
      const loopX = [...ax, ...[...bx].reverse()];
      const loopZ = [...az, ...[...bz].reverse()];
      expectClose(areaBetweenPolylines(ax, az, bx, bz), -shoelaceArea(loopX, loopZ), 1e-9, { label: 'loop area', abs: 1e-7 });
    }));
  });
});
