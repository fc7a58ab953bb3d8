import { describe, expect, it } from 'vitest';
import { nearestOnPolyline } from '../../../src/core/geometry/nearestOnPolyline';
import { expectClose } from '../../expectClose';

// Analytic: the nearest point of a segment is the foot of the perpendicular, clamped to the segment
// (common practice in computational geometry, recalled from memory).
describe('nearestOnPolyline(xs, zs, x, z)', () => {
  it('drops a perpendicular onto the nearest segment and measures along the line', () => {
    // An L: (0,0) → (4,0) → (4,3). The point (5, 1) is 1 from the vertical leg at (4, 1): 4 + 1 along.
    const p = nearestOnPolyline([0, 4, 4], [0, 0, 3], 5, 1)!;
    expectClose(p.distance, 1, 1e-15);
    expect(p.segment).toBe(1);
    expectClose(p.t, 1 / 3, 1e-15);
    expectClose(p.along, 5, 1e-15);
  });

  it('clamps to the ends beyond the line (3-4-5 triangle distance)', () => {
    const p = nearestOnPolyline([0, 4], [0, 0], 7, 4)!;
    expectClose(p.distance, 5, 1e-15);
    expect(p.t).toBe(1);
    expectClose(p.along, 4, 1e-15);
  });

  it('keeps its digits at map-scale coordinates (the offset is taken from each segment start)', () => {
    const p = nearestOnPolyline([500_000, 500_010], [4_000_000, 4_000_010], 500_000, 4_000_010)!;
    // Distance from (0, 10) to the line z = x: 10/√2.
    expectClose(p.distance, 10 / Math.SQRT2, 1e-12);
    expectClose(p.along, 10 / Math.SQRT2, 1e-12);
  });

  it('is null for a line of fewer than two vertices', () => {
    expect(nearestOnPolyline([1], [1], 0, 0)).toBeNull();
  });
});
