import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { segmentsIntersect } from '../../../src/core/geometry/segmentsIntersect';
import { selfIntersections } from '../../../src/core/geometry/selfIntersections';

/** O(n²) reference: every non-adjacent pair of segments that meets (adjacent pairs: collinear fold-back). */
function bruteForce(xs: number[], zs: number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < xs.length - 1; i++) {
    for (let j = i + 2; j < xs.length - 1; j++) {
      if (segmentsIntersect(xs[i], zs[i], xs[i + 1], zs[i + 1], xs[j], zs[j], xs[j + 1], zs[j + 1])) out.push([i, j]);
    }
  }
  return out;
}

describe('selfIntersections(xs, zs)', () => {
  it('finds the crossing of a line that loops over itself', () => {
    // Segment 0 (0,0)-(10,0) is crossed by segment 2 (10,5)-(5,-5).
    expect(selfIntersections([0, 10, 10, 5], [0, 0, 5, -5])).toEqual([[0, 2]]);
  });

  it('is empty for a line without crossings', () => {
    expect(selfIntersections([0, 1, 2, 3], [0, 5, 0, 5])).toEqual([]);
  });

  it('flags a line that doubles back on itself along one direction', () => {
    expect(selfIntersections([0, 10, 4], [0, 0, 0])).toEqual([[0, 1]]);
  });

  it('ignores repeated consecutive vertices', () => {
    expect(selfIntersections([0, 1, 1, 2], [0, 1, 1, 0])).toEqual([]);
  });

  it('handles a 10,000-vertex folded horizon and finds one added crossing', () => {
    const n = 10_000;
    const xs: number[] = [];
    const zs: number[] = [];
    for (let i = 0; i < n; i++) {
      xs.push(i);
      zs.push(100 * Math.sin(i / 50));
    }
    expect(selfIntersections(xs, zs)).toEqual([]);
    // A hook at the end that runs back over the start of the line.
    xs.push(n, 0.5);
    zs.push(-500, 10);
    const found = selfIntersections(xs, zs);
    expect(found.length).toBeGreaterThan(0);
    expect(found.every(([i, j]) => i < j && j === n)).toBe(true);
  });

  it('selfIntersections agrees with an all-pairs check on random lines (property)', () => {
    const pt = fc.tuple(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 20 }));
    fc.assert(fc.property(fc.array(pt, { minLength: 2, maxLength: 25 }), (pts) => {
      // Keep the lines free of repeated consecutive vertices, which selfIntersections skips by design.
      const clean = pts.filter((p, i) => i === 0 || p[0] !== pts[i - 1][0] || p[1] !== pts[i - 1][1]);
      const xs = clean.map((p) => p[0]);
      const zs = clean.map((p) => p[1]);
      const brute = bruteForce(xs, zs);
      for (let i = 0; i + 2 < xs.length; i++) {
        const ax = xs[i] - xs[i + 1], az = zs[i] - zs[i + 1], dx = xs[i + 2] - xs[i + 1], dz = zs[i + 2] - zs[i + 1];
        if (ax * dz - az * dx === 0 && ax * dx + az * dz > 0) brute.push([i, i + 1]);
      }
      brute.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
      expect(selfIntersections(xs, zs, 10_000)).toEqual(brute);
    }));
  });
});
