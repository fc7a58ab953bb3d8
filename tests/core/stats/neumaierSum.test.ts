import { describe, expect, it } from 'vitest';
import { neumaierSum } from '../../../src/core/stats/neumaierSum';

describe('neumaierSum(values)', () => {
  it('keeps small terms that a plain loop loses', () => {
    // Neumaier (1974) example form: the plain sum of [1, 1e100, 1, −1e100] is 0, the exact sum 2.
    const values = [1, 1e100, 1, -1e100];
    expect(values.reduce((a, b) => a + b, 0)).toBe(0);
    expect(neumaierSum(values)).toBe(2);
  });

  it('sums a million copies of 0.1 to the correctly rounded value', () => {
    // Exact arithmetic: 1e6 copies of 0.1 (as a double, 0.1000000000000000055511151231257827) sum to
    // 100000.0000000000055511151231257827, whose nearest double is 100000.
    const values = new Float64Array(1_000_000).fill(0.1);
    expect(neumaierSum(values)).toBe(100000);
    let naive = 0;
    for (const v of values) naive += v;
    expect(naive).not.toBe(100000);
  });

  it('returns 0 for no values and propagates infinities and NaN', () => {
    expect(neumaierSum([])).toBe(0);
    expect(neumaierSum([1, Infinity, 2])).toBe(Infinity);
    expect(neumaierSum([Infinity, -Infinity])).toBeNaN();
    expect(neumaierSum([1, NaN])).toBeNaN();
  });
});
