import { describe, expect, it } from 'vitest';
import { niceDomain, niceStep, niceTicks } from '../../src/format/niceTicks';

describe('niceTicks(min, max, target)', () => {
  // Common practice for chart axes: steps of 1, 2 or 5 times a power of ten.
  it('steps by 1, 2 or 5 × 10ᵏ', () => {
    for (const [lo, hi] of [[0, 3700], [-2600, 1100], [0.013, 0.41], [12, 13], [-5e6, 2.7e7]]) {
      const { step, values } = niceTicks(lo, hi, 5);
      const mantissa = step / Math.pow(10, Math.floor(Math.log10(step) + 1e-9));
      expect([1, 2, 5]).toContain(Number(mantissa.toPrecision(6)));
      expect(values.length).toBeGreaterThanOrEqual(3);
      expect(values.length).toBeLessThanOrEqual(11);
      for (const v of values) {
        expect(v).toBeGreaterThanOrEqual(lo - 1e-9 * Math.abs(step));
        expect(v).toBeLessThanOrEqual(hi + 1e-9 * Math.abs(step));
      }
    }
  });

  it('gives 0, 1000, 2000, 3000 for 0…3700 m and clean decimals for small ranges', () => {
    expect(niceTicks(0, 3700, 4).values).toEqual([0, 1000, 2000, 3000]);
    expect(niceTicks(0, 1, 5).values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(0.1, 0.35, 5).values).toEqual([0.1, 0.15, 0.2, 0.25, 0.3, 0.35]);
    expect(niceStep(8, 1)).toBe(10);
    expect(niceStep(7.3, 1)).toBe(5);
  });

  it('handles an empty or bad range', () => {
    expect(niceTicks(5, 5).values).toEqual([5]);
    expect(niceTicks(NaN, 1).values).toEqual([]);
  });

  it('niceDomain widens a range to whole steps', () => {
    expect(niceDomain(130, 3720, 5)).toEqual([0, 4000]);
    const [a, b] = niceDomain(7, 7);
    expect(a).toBeLessThan(7);
    expect(b).toBeGreaterThan(7);
  });
});
