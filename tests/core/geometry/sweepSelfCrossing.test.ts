import { lineString } from '@turf/helpers';
import kinks from '@turf/kinks';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { selfCrossingsAllPairs, sweepSelfCrossing } from '../../../src/core/geometry/sweepSelfCrossing';

/** The answer of the default path (chain walk, then sweep), checked to be the sweep's alone. */
const cross = (pts: [number, number][]) => {
  const xs = pts.map((p) => p[0]), zs = pts.map((p) => p[1]);
  const quick = sweepSelfCrossing(xs, zs);
  const swept = sweepSelfCrossing(xs, zs, false);
  expect(swept !== null).toBe(quick !== null);
  return quick;
};

describe('sweepSelfCrossing: what counts as a crossing (hand-drawn cases)', () => {
  it('finds the crossing of a line that loops over itself', () => {
    // Segment 0 (0,0)-(10,0) is crossed by segment 2 (10,5)-(5,-5).
    expect(cross([[0, 0], [10, 0], [10, 5], [5, -5]])).toEqual([0, 2]);
  });

  it('is null for a zigzag without crossings, and for fewer than three vertices', () => {
    expect(cross([[0, 0], [1, 5], [2, 0], [3, 5]])).toBeNull();
    expect(cross([[0, 0], [1, 1]])).toBeNull();
  });

  it('does not count a line that doubles back along itself (a retrace encloses no area)', () => {
    expect(cross([[0, 0], [10, 0], [4, 0]])).toBeNull();
  });

  it('does not count a horizon that runs down a fault and back up it, wholly or in part', () => {
    // Footwall at z = 100 to the fault at x = 50; down the fault to (60, 40); back up to where it left.
    expect(cross([[0, 100], [50, 100], [60, 40], [50, 100], [100, 100]])).toBeNull();
    // Back up only half way (55, 70), then on to the right along z = 70: touches the fault stretch, does not cross.
    expect(cross([[0, 100], [50, 100], [60, 40], [55, 70], [100, 70]])).toBeNull();
  });

  it('counts a vertex on another stretch when the line passes through it, not when it turns back', () => {
    // (5, 0) lies inside segment 0: from above to below is a crossing; from above and back up is a touch.
    expect(cross([[0, 0], [10, 0], [5, 5], [5, 0], [5, -5]])).not.toBeNull();
    expect(cross([[0, 0], [10, 0], [5, 5], [5, 0], [7, 3]])).toBeNull();
  });

  it('counts a vertex visited twice when the two visits cross there, not when they only touch', () => {
    // (1, 1) visited from (0,0) towards (2,2), then from (2,0) towards (0,2): an X through the vertex.
    expect(cross([[0, 0], [1, 1], [2, 2], [2, 0], [1, 1], [0, 2]])).not.toBeNull();
    // The second visit comes from (2,0) and leaves towards (1,0): both on the same side of the first.
    expect(cross([[0, 0], [1, 1], [2, 2], [2, 0], [1, 1], [1, 0]])).toBeNull();
  });

  it('ignores repeated consecutive vertices', () => {
    expect(cross([[0, 0], [1, 1], [1, 1], [2, 0]])).toBeNull();
    expect(cross([[0, 0], [10, 0], [10, 0], [10, 5], [5, -5]])).toEqual([0, 3]);
  });

  it('judges a near-touching fold-back exactly where plain floating point gets the side wrong', () => {
    // c lies a hair to the left of A→B. The plain formula (bx−ax)(cz−az) − (bz−az)(cx−ax) rounds to the wrong
    // sign here; the line then comes back from the left and leaves to the left, so it does not cross.
    const A: [number, number] = [0.1, 0.3], B: [number, number] = [17.3, 29.9];
    const c: [number, number] = [5.4343563999999995, 9.480055199999999];
    const plain = (B[0] - A[0]) * (c[1] - A[1]) - (B[1] - A[1]) * (c[0] - A[0]);
    expect(plain).toBeLessThan(0);
    // Exact: with a = A, the sign of (B − A) × (c − A) in rationals (BigInt, every double is an exact dyadic rational).
    const exact = exactOrient(A, B, c);
    expect(exact).toBe(1);
    expect(cross([A, B, [c[0] - 3, c[1] + 2], c, [c[0] - 2, c[1] + 3]])).toBeNull();
  });
});

describe('sweepSelfCrossing on long lines', () => {
  it('passes a 1,000,000-vertex steep zigzag and finds one crossing added at its end', () => {
    const n = 1_000_000;
    const xs = new Float64Array(n + 2);
    const zs = new Float64Array(n + 2);
    for (let i = 0; i < n; i++) { xs[i] = i % 2; zs[i] = -i; }
    expect(sweepSelfCrossing(xs.subarray(0, n), zs.subarray(0, n))).toBeNull();
    expect(sweepSelfCrossing(xs.subarray(0, n), zs.subarray(0, n), false)).toBeNull();
    // A hook back up across the first segment: (1, −n) → (2, −n) → (0.25, 0.5) crosses (0,0)–(1,−1).
    xs[n] = 2; zs[n] = -n;
    xs[n + 1] = -0.5; zs[n + 1] = -0.25;
    const hit = sweepSelfCrossing(xs, zs);
    expect(hit).not.toBeNull();
    expect(hit![1]).toBe(n);
  }, 60_000);

  it('sweeps a zigzag along a diagonal (x and z both reverse at every vertex) and finds a crossing added at its end', () => {
    // Even vertices on x = z, odd ones on x − z = 2, each a half step further along: no crossing (constructed so).
    const n = 200_000;
    const xs = new Float64Array(n + 2);
    const zs = new Float64Array(n + 2);
    for (let i = 0; i < n; i++) { const off = i % 2; xs[i] = i * 0.5 + off; zs[i] = i * 0.5 - off; }
    expect(sweepSelfCrossing(xs.subarray(0, n), zs.subarray(0, n))).toBeNull();
    // Back from the last vertex to (1, −1) and on to (0.5, 1): the last segment crosses segment 0, (0, 0)–(1.5, −0.5).
    xs[n] = 1; zs[n] = -1;
    xs[n + 1] = 0.5; zs[n + 1] = 1;
    const hit = sweepSelfCrossing(xs, zs);
    expect(hit).toEqual([0, n]);
  }, 60_000);
});

describe('sweepSelfCrossing against independent checks (properties)', () => {
  it('finds a crossing exactly when the all-pairs search does, on small grids full of touches and overlaps', () => {
    // Integer grid: vertical segments, collinear overlaps, touches, shared and repeated vertices are common.
    const pt = fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 }));
    fc.assert(fc.property(fc.array(pt, { minLength: 2, maxLength: 40 }), (pts) => {
      const all = selfCrossingsAllPairs(pts.map((p) => p[0]), pts.map((p) => p[1]));
      const one = cross(pts);
      expect(one !== null).toBe(all.length > 0);
      if (one) expect(all).toContainEqual(one);
      const swept = sweepSelfCrossing(pts.map((p) => p[0]), pts.map((p) => p[1]), false);
      if (swept) expect(all).toContainEqual(swept);
    }), { numRuns: 3000 });
  }, 60_000);

  it('gives the same verdict with x and z swapped (the sweep runs along the axis the line reverses on less)', () => {
    // Swapping the axes mirrors the plane: which stretches cross is unchanged (the all-pairs search on the
    // swapped points is the reference). Lines that reverse more in x than in z are swept along z.
    const pt = fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 }));
    fc.assert(fc.property(fc.array(pt, { minLength: 2, maxLength: 40 }), (pts) => {
      const swapped = pts.map(([x, z]): [number, number] => [z, x]);
      const all = selfCrossingsAllPairs(swapped.map((p) => p[0]), swapped.map((p) => p[1]));
      expect(all.length > 0).toBe(selfCrossingsAllPairs(pts.map((p) => p[0]), pts.map((p) => p[1])).length > 0);
      const one = cross(swapped);
      expect(one !== null).toBe(all.length > 0);
      if (one) expect(all).toContainEqual(one);
    }), { numRuns: 3000 });
  }, 60_000);

  it('agrees with @turf/kinks on random lines in general position', () => {
    // @turf/kinks (npm) tests all non-adjacent pairs in plain floating point; it counts touches and overlaps
    // differently, so only lines in general position are compared (fc.pre), where both rules are the same.
    const coord = fc.noBias(fc.integer({ min: -1_000_000, max: 1_000_000 })).map((v) => v / 1024);
    fc.assert(fc.property(fc.array(fc.tuple(coord, coord), { minLength: 2, maxLength: 60 }), (pts) => {
      fc.pre(generalPosition(pts));
      expect(cross(pts) !== null).toBe(kinks(lineString(pts)).features.length > 0);
    }), { numRuns: 500 });
  }, 60_000);

  it('agrees with @turf/kinks on horizon-like lines with overturned limbs', () => {
    const step = fc.tuple(fc.noBias(fc.integer({ min: -3000, max: 10_000 })), fc.noBias(fc.integer({ min: -5000, max: 5000 })));
    fc.assert(fc.property(fc.array(step, { minLength: 1, maxLength: 120 }), (steps) => {
      const pts: [number, number][] = [[0, 0]];
      for (const [dx, dz] of steps) {
        const [x, z] = pts[pts.length - 1];
        pts.push([x + dx / 1000, z + dz / 1000]);
      }
      fc.pre(generalPosition(pts));
      expect(cross(pts) !== null).toBe(kinks(lineString(pts)).features.length > 0);
    }), { numRuns: 500 });
  }, 60_000);

  it('agrees with @turf/kinks on steep limbs traced densely (many segments overlapping in x)', () => {
    const jitter = fc.noBias(fc.integer({ min: -1000, max: 1000 }));
    fc.assert(fc.property(fc.array(jitter, { minLength: 3, maxLength: 200 }), (js) => {
      const pts: [number, number][] = js.map((j, i) => [j / 100, -i + (j % 7) / 10]);
      fc.pre(generalPosition(pts));
      expect(cross(pts) !== null).toBe(kinks(lineString(pts)).features.length > 0);
    }), { numRuns: 200 });
  }, 60_000);
});

/** Sign of (b − a) × (c − a) computed exactly: each double as an integer times 2^-1100 (BigInt). */
function exactOrient(a: [number, number], b: [number, number], c: [number, number]): number {
  const big = (v: number): bigint => {
    // v = m · 2^e with integer m; scale every value to the common exponent −1100 (below any double's).
    if (v === 0) return 0n;
    let e = 0;
    let m = v;
    while (!Number.isInteger(m)) { m *= 2; e -= 1; }
    return BigInt(m) << BigInt(e + 1100);
  };
  const [ax, az, bx, bz, cx, cz] = [a[0], a[1], b[0], b[1], c[0], c[1]].map(big);
  const d = (bx - ax) * (cz - az) - (bz - az) * (cx - ax);
  return d > 0n ? 1 : d < 0n ? -1 : 0;
}

const orient = (a: [number, number], b: [number, number], c: [number, number]) => exactOrient(a, b, c);

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
