import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { shoelaceArea } from '../../../src/core/geometry/shoelaceArea';

describe('shoelaceArea(xs, zs)', () => {
  it('is ½·base·height for a counter-clockwise right triangle', () => {
    // Analytic: triangle with legs 4 and 3 has area 6.
    expect(shoelaceArea([0, 4, 0], [0, 0, 3])).toBe(6);
  });

  it('is negative for a clockwise ring', () => {
    // Analytic: same triangle, opposite orientation.
    expect(shoelaceArea([0, 0, 4], [0, 3, 0])).toBe(-6);
  });

  it('reads a sub-range of typed arrays', () => {
    // Analytic: unit square (area 1) embedded between other values.
    const xs = new Float64Array([9, 0, 1, 1, 0, 9]);
    const zs = new Float64Array([9, 0, 0, 1, 1, 9]);
    expect(shoelaceArea(xs, zs, 1, 5)).toBe(1);
  });

  it('is 0 for fewer than three vertices', () => {
    expect(shoelaceArea([0, 1], [0, 1])).toBe(0);
  });

  it('keeps every digit of a unit square at map-scale offsets (x ~ 1e6, z ~ 1e6)', () => {
    // Analytic: unit square; the local origin avoids the cancellation of x·z ~ 1e12 products.
    const x0 = 1_234_567.125;
    const z0 = 987_654.25;
    expect(shoelaceArea([x0, x0 + 1, x0 + 1, x0], [z0, z0, z0 + 1, z0 + 1])).toBe(1);
  });

  const ring = fc.array(fc.tuple(fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true })), { minLength: 3, maxLength: 30 });

  it('shoelaceArea is invariant under translation (property)', () => {
    fc.assert(fc.property(ring, fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (pts, dx, dz) => {
      const a = shoelaceArea(pts.map((p) => p[0]), pts.map((p) => p[1]));
      const b = shoelaceArea(pts.map((p) => p[0] + dx), pts.map((p) => p[1] + dz));
      const scale = pts.reduce((s, p) => s + Math.abs(p[0]) + Math.abs(p[1]), 0) ** 2;
      expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * scale + 1e-9);
    }));
  });

  it('shoelaceArea changes sign when the ring is reversed (property)', () => {
    fc.assert(fc.property(ring, (pts) => {
      const a = shoelaceArea(pts.map((p) => p[0]), pts.map((p) => p[1]));
      const r = [...pts].reverse();
      const b = shoelaceArea(r.map((p) => p[0]), r.map((p) => p[1]));
      const scale = pts.reduce((s, p) => s + Math.abs(p[0]) + Math.abs(p[1]), 0) ** 2;
      expect(Math.abs(a + b)).toBeLessThanOrEqual(1e-12 * scale + 1e-12);
    }));
  });

  it('shoelaceArea scales by k² when x and z scale by k (property)', () => {
    fc.assert(fc.property(ring, fc.constantFrom(1e-3, 0.5, 3, 1e4), (pts, k) => {
      const a = shoelaceArea(pts.map((p) => p[0]), pts.map((p) => p[1]));
      const b = shoelaceArea(pts.map((p) => k * p[0]), pts.map((p) => k * p[1]));
      const scale = pts.reduce((s, p) => s + Math.abs(p[0]) + Math.abs(p[1]), 0) ** 2;
      expect(Math.abs(b - k * k * a)).toBeLessThanOrEqual(1e-12 * k * k * scale + 1e-300);
    }));
  });
});
