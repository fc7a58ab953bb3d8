import { describe, expect, it } from 'vitest';
import { meanElevation } from '../../../src/core/geometry/meanElevation';
import { trapezoidIntegral } from '../../../src/core/geometry/trapezoidIntegral';
import { expectClose } from '../../expectClose';

describe('trapezoidIntegral(xs, zs, zOrigin)', () => {
  it('integrates z = x exactly over [0, 2]', () => {
    // Analytic: ∫₀² x dx = 2.
    expect(trapezoidIntegral([0, 0.5, 2], [0, 0.5, 2])).toBe(2);
  });

  it('subtracts the origin: ∫ (z − z0) dx', () => {
    // Analytic: ∫₀¹⁰ (5 − 5) dx = 0 and ∫₀¹⁰ (5 − 2) dx = 30.
    expect(trapezoidIntegral([0, 10], [5, 5], 5)).toBe(0);
    expect(trapezoidIntegral([0, 10], [5, 5], 2)).toBe(30);
  });

  it('is negative when x runs backwards', () => {
    expect(trapezoidIntegral([2, 0], [1, 1])).toBe(-2);
  });
});

describe('meanElevation(xs, zs)', () => {
  it('is the mid-value of an inclined straight regional, however it is sampled', () => {
    // Analytic: mean of z = 100 + 0.1x over [0, 1000] is 150.
    const xs = [0, 13, 400, 401, 1000];
    expectClose(meanElevation(xs, xs.map((x) => 100 + 0.1 * x)), 150, 1e-14);
  });

  it('is the exact integral mean of a bent regional', () => {
    // Analytic: z = 0 on [0, 500], rising to 100 at 1000: ∫ = 25 000, mean 25.
    expectClose(meanElevation([0, 500, 1000], [0, 0, 100]), 25, 1e-14);
  });

  it('is NaN for a zero-width line', () => {
    expect(meanElevation([3, 3], [1, 2])).toBeNaN();
  });
});
