import { describe, expect, it } from 'vitest';
import { percentile } from '../../../src/core/stats/percentile';

describe('percentile(sorted, p)', () => {
  it('interpolates linearly between order statistics (Hyndman & Fan type 7)', () => {
    // Hand computation from the definition: position (n − 1)·p in [1, 2, 3, 4, 10].
    const values = [1, 2, 3, 4, 10];
    expect(percentile(values, 0)).toBe(1);
    expect(percentile(values, 1)).toBe(10);
    expect(percentile(values, 0.5)).toBe(3);
    expect(percentile(values, 0.25)).toBe(2);
    expect(percentile(values, 0.9)).toBeCloseTo(4 + 0.6 * 6, 14);
    expect(percentile(values, 0.1)).toBeCloseTo(1.4, 14);
  });

  it('returns P10/P50/P90 of 1..101 as 11, 51, 91', () => {
    const values = Array.from({ length: 101 }, (_, i) => i + 1);
    expect(percentile(values, 0.1)).toBeCloseTo(11, 12);
    expect(percentile(values, 0.5)).toBe(51);
    expect(percentile(values, 0.9)).toBeCloseTo(91, 12);
  });

  it('handles one value, typed arrays and bad input', () => {
    expect(percentile([7], 0.3)).toBe(7);
    expect(percentile(new Float64Array([0, 10]), 0.25)).toBe(2.5);
    expect(percentile([], 0.5)).toBeNaN();
    expect(percentile([1, 2], -0.1)).toBeNaN();
    expect(percentile([1, 2], 1.5)).toBeNaN();
    expect(percentile([1, 2], NaN)).toBeNaN();
  });
});
