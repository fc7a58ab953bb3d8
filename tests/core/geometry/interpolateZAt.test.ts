import { describe, expect, it } from 'vitest';
import { interpolateZAt } from '../../../src/core/geometry/interpolateZAt';

describe('interpolateZAt(xs, zs, x)', () => {
  it('interpolates linearly inside a segment and returns vertex values exactly', () => {
    // Analytic: linear interpolation between (0, 10) and (10, 30).
    expect(interpolateZAt([0, 10, 20], [10, 30, 30], 2.5)).toBe(15);
    expect(interpolateZAt([0, 10, 20], [10, 30, 30], 10)).toBe(30);
  });

  it('works for a line given right to left', () => {
    expect(interpolateZAt([20, 0], [0, 10], 5)).toBe(7.5);
  });

  it('is NaN outside the line', () => {
    expect(interpolateZAt([0, 10], [0, 0], 11)).toBeNaN();
  });
});
