// The box of a line's points, checked against a fold over the same points written here (our own check) and an
// example worked by hand.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { pointsBox } from '../../../src/core/geometry/pointsBox';

describe('pointsBox(points)', () => {
  it('is the smallest and largest x and y of any list of points, as a plain fold gives them', () => {
    const pt = fc.tuple(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: -1e9, max: 1e9, noNaN: true }));
    fc.assert(fc.property(fc.array(pt, { minLength: 1, maxLength: 50 }), (points) => {
      const fold = points.reduce(([a, b, c, d], [x, y]) => [Math.min(a, x), Math.min(b, y), Math.max(c, x), Math.max(d, y)], [Infinity, Infinity, -Infinity, -Infinity]);
      expect(pointsBox(points)).toEqual(fold);
    }));
  });

  it('frames a line worked by hand, gives an empty line the empty box, and remembers the box per array', () => {
    // x runs 10 … 300 009; y = 20 + k + (k mod 7) is lowest at k = 0 (20), highest at k = 299 998 (300 024).
    const line: [number, number][] = Array.from({ length: 300_000 }, (_, k) => [10 + k, 20 + (k % 7) + k]);
    expect(pointsBox(line)).toEqual([10, 20, 300_009, 300_024]);
    expect(pointsBox(line)).toBe(pointsBox(line));
    expect(pointsBox([])).toEqual([Infinity, Infinity, -Infinity, -Infinity]);
    // A copy with one point moved is a new array and gets its own box.
    const moved = line.map((p) => p);
    moved[5] = [-3, 400_000];
    expect(pointsBox(moved)).toEqual([-3, 20, 300_009, 400_000]);
  });
});
