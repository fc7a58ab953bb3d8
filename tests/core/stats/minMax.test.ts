import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { maxOf, minMax, minOf } from '../../../src/core/stats/minMax';

// Reference: the language's own Math.min / Math.max (ECMAScript §21.3.2.24–25), called on lists short
// enough for them; and Array.prototype.reduce for lists past the engine's argument limit.
describe('minMax, minOf, maxOf', () => {
  it('agree with Math.min and Math.max on short lists, with extra numbers and NaN', () => {
    // Signed zeros are left out: which of 0 and -0 is "smaller" is not what these helpers are for.
    const value = fc.oneof(fc.double(), fc.integer()).map((v) => (v === 0 ? 0 : v));
    fc.assert(fc.property(fc.array(value, { maxLength: 50 }), fc.array(value, { maxLength: 3 }), (xs, extra) => {
      /* eslint-disable no-restricted-syntax -- the built-ins are the reference here, on short lists */
      expect(minOf(xs, ...extra)).toBe(Math.min(...extra, ...xs));
      expect(maxOf(xs, ...extra)).toBe(Math.max(...extra, ...xs));
      expect(minMax(xs)).toEqual([Math.min(...xs), Math.max(...xs)]);
      /* eslint-enable no-restricted-syntax */
    }));
  });

  it('handle a list of 1,000,000 values, where the spread form throws RangeError', () => {
    const xs = new Float64Array(1_000_000);
    for (let i = 0; i < xs.length; i++) xs[i] = Math.sin(i) * 1e3 + i * 1e-3;
    const list = Array.from(xs);
    // eslint-disable-next-line no-restricted-syntax -- shows the failure this module exists to avoid
    expect(() => Math.max(...list)).toThrow(RangeError);
    const lo = list.reduce((a, b) => (b < a ? b : a), Infinity);
    const hi = list.reduce((a, b) => (b > a ? b : a), -Infinity);
    expect(minMax(xs)).toEqual([lo, hi]);
    expect(minOf(list)).toBe(lo);
    expect(maxOf(list, -1e9)).toBe(hi);
  });
});
