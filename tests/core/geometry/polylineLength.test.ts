import { describe, expect, it } from 'vitest';
import { polylineLength } from '../../../src/core/geometry/polylineLength';
import { expectClose } from '../../expectClose';

describe('polylineLength(xs, zs)', () => {
  it('is 5 for a 3-4-5 segment and adds segments', () => {
    // Analytic: Pythagorean triples 3-4-5 and 5-12-13.
    expect(polylineLength([0, 3, 8], [0, 4, 16])).toBe(18);
  });

  it('is 0 for a single vertex', () => {
    expect(polylineLength([1], [2])).toBe(0);
  });

  it('keeps digits at map-scale offsets', () => {
    // Analytic: √2 for a unit diagonal, placed at x ~ 1e6.
    expectClose(polylineLength([1e6 + 0.5, 1e6 + 1.5], [2e5, 2e5 + 1]), Math.SQRT2, 1e-12);
  });
});
