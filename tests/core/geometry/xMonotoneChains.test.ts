import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { xMonotoneChains } from '../../../src/core/geometry/xMonotoneChains';

describe('xMonotoneChains(xs, zs)', () => {
  it('is one increasing chain for a line along which x only increases', () => {
    const c = xMonotoneChains([0, 1, 2, 5], [0, 3, -1, 2]);
    expect(c.count).toBe(1);
    expect([c.firstSegment[0], c.lastSegment[0], c.direction[0], c.minX[0], c.maxX[0]]).toEqual([0, 2, 1, 0, 5]);
  });

  it('splits where x turns back, and makes a vertical segment a chain of its own', () => {
    // Segments: 0 (0→4), 1 (4→2, back), 2 (vertical at x = 2), 3 (2→6).
    const c = xMonotoneChains([0, 4, 2, 2, 6], [0, 1, 2, 5, 5]);
    expect(Array.from(c.firstSegment)).toEqual([0, 1, 2, 3]);
    expect(Array.from(c.lastSegment)).toEqual([0, 1, 2, 3]);
    expect(Array.from(c.direction)).toEqual([1, -1, 0, 1]);
    expect(Array.from(c.minX)).toEqual([0, 2, 2, 2]);
    expect(Array.from(c.maxX)).toEqual([4, 4, 2, 6]);
  });

  it('keeps a repeated vertex inside the chain it sits in', () => {
    expect(xMonotoneChains([0, 1, 1, 2], [0, 1, 1, 0]).count).toBe(1);
  });

  it('covers every segment once with chains along which x is strictly monotone (property)', () => {
    const pt = fc.tuple(fc.integer({ min: 0, max: 8 }), fc.integer({ min: 0, max: 8 }));
    fc.assert(fc.property(fc.array(pt, { minLength: 2, maxLength: 30 }), (pts) => {
      const xs = pts.map((p) => p[0]);
      const zs = pts.map((p) => p[1]);
      const c = xMonotoneChains(xs, zs);
      expect(c.firstSegment[0]).toBe(0);
      expect(c.lastSegment[c.count - 1]).toBe(xs.length - 2);
      for (let k = 0; k < c.count; k++) {
        if (k > 0) expect(c.firstSegment[k]).toBe(c.lastSegment[k - 1] + 1);
        const real: number[] = [];
        for (let s = c.firstSegment[k]; s <= c.lastSegment[k]; s++) {
          if (xs[s] !== xs[s + 1] || zs[s] !== zs[s + 1]) real.push(Math.sign(xs[s + 1] - xs[s]));
        }
        // Segments of positive length all share the chain's direction; a vertical one stands alone.
        expect(real.every((d) => d === c.direction[k])).toBe(true);
        if (c.direction[k] === 0) expect(real.length).toBe(1);
      }
    }), { numRuns: 500 });
  });
});
