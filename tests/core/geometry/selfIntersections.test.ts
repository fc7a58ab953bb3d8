import { lineString } from '@turf/helpers';
import kinks from '@turf/kinks';
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

  it('selfIntersections agrees with the all-pairs check with repeated vertices and vertical segments (property)', () => {
    // Small integer grid: vertical segments, collinear overlaps, touches and repeats are all common.
    const pt = fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 }));
    fc.assert(fc.property(fc.array(pt, { minLength: 2, maxLength: 30 }), (pts) => {
      const xs = pts.map((p) => p[0]);
      const zs = pts.map((p) => p[1]);
      expect(selfIntersections(xs, zs, 100_000)).toEqual(compactedBruteForce(xs, zs));
    }), { numRuns: 500 });
  });

  it('selfIntersections finds the same crossings as @turf/kinks on lines in general position (property)', () => {
    // @turf/kinks (npm, planar segment intersections over all non-adjacent pairs) is the independent
    // library check. It treats touches and collinear overlaps differently, so only lines in general
    // position are compared (fc.pre); there each crossing pair gives exactly one kink point.
    const coord = fc.noBias(fc.integer({ min: -1_000_000, max: 1_000_000 })).map((v) => v / 1024);
    fc.assert(fc.property(fc.array(fc.tuple(coord, coord), { minLength: 2, maxLength: 40 }), (pts) => {
      fc.pre(generalPosition(pts));
      const ours = selfIntersections(pts.map((p) => p[0]), pts.map((p) => p[1]), 100_000);
      expect(ours.length).toBe(kinks(lineString(pts)).features.length);
    }), { numRuns: 300 });
  });

  it('selfIntersections agrees with @turf/kinks on horizon-like lines with overturned limbs (property)', () => {
    // Lines that mostly run left to right and now and then fold back, like an overturned fold.
    const step = fc.tuple(fc.noBias(fc.integer({ min: -3000, max: 10_000 })), fc.noBias(fc.integer({ min: -5000, max: 5000 })));
    fc.assert(fc.property(fc.array(step, { minLength: 1, maxLength: 60 }), (steps) => {
      const pts: [number, number][] = [[0, 0]];
      for (const [dx, dz] of steps) {
        const [x, z] = pts[pts.length - 1];
        pts.push([x + dx / 1000, z + dz / 1000]);
      }
      fc.pre(generalPosition(pts));
      const ours = selfIntersections(pts.map((p) => p[0]), pts.map((p) => p[1]), 100_000);
      expect(ours.length).toBe(kinks(lineString(pts)).features.length);
      expect(ours.length > 0).toBe(bruteForce(pts.map((p) => p[0]), pts.map((p) => p[1])).length > 0);
    }), { numRuns: 300 });
  });
});

/** All-pairs reference on the line with repeated consecutive vertices dropped, reported as input segment indices. */
function compactedBruteForce(xs: number[], zs: number[]): [number, number][] {
  const kx: number[] = [];
  const kz: number[] = [];
  const seg: number[] = [];
  for (let i = 0; i < xs.length; i++) {
    if (kx.length > 0 && xs[i] === kx[kx.length - 1] && zs[i] === kz[kz.length - 1]) continue;
    if (kx.length > 0) seg.push(i - 1);
    kx.push(xs[i]);
    kz.push(zs[i]);
  }
  const out = bruteForce(kx, kz);
  for (let i = 0; i + 2 < kx.length; i++) {
    const ax = kx[i] - kx[i + 1], az = kz[i] - kz[i + 1], dx = kx[i + 2] - kx[i + 1], dz = kz[i + 2] - kz[i + 1];
    if (ax * dz - az * dx === 0 && ax * dx + az * dz > 0) out.push([i, i + 1]);
  }
  return out.map(([i, j]): [number, number] => [seg[i], seg[j]]).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
}

const orient = (a: [number, number], b: [number, number], c: [number, number]) => (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);

/** No repeated vertex, no three consecutive collinear vertices, and no vertex collinear with a segment it is not on. */
function generalPosition(pts: [number, number][]): boolean {
  for (let i = 0; i + 1 < pts.length; i++) {
    if (pts[i][0] === pts[i + 1][0] && pts[i][1] === pts[i + 1][1]) return false;
    if (i + 2 < pts.length && orient(pts[i], pts[i + 1], pts[i + 2]) === 0) return false;
    for (let j = i + 2; j + 1 < pts.length; j++) {
      const [a, b, c, d] = [pts[i], pts[i + 1], pts[j], pts[j + 1]];
      if (orient(a, b, c) === 0 || orient(a, b, d) === 0 || orient(c, d, a) === 0 || orient(c, d, b) === 0) return false;
    }
  }
  return true;
}
