// Split a polyline into x-monotone chains: maximal runs of segments along which x strictly
// increases (direction +1) or strictly decreases (−1); a vertical segment is a chain of its own
// (direction 0). Zero-length segments (repeated vertices) join the chain they sit in. Within a
// chain, segments that are not neighbours have disjoint x-ranges, which is what makes
// a line that is one chain safe to pass without the self-crossing test (sweepSelfCrossing). Coordinates are compared
// relative to the first vertex, the local origin the intersection tests use (docs/method.md §Numerics).

/** Chains in line order; segment indices are input segments (segment s joins vertices s and s+1). */
export interface XMonotoneChains {
  count: number;
  firstSegment: Int32Array;
  lastSegment: Int32Array;
  /** +1: x increases along the chain, −1: decreases, 0: one vertical segment. */
  direction: Int8Array;
  /** x-range of the chain, relative to the first vertex of the line. */
  minX: Float64Array;
  maxX: Float64Array;
}

const UNSET = 2;

/** The x-monotone chains of xs/zs[0..n) (n ≥ 2), x-ranges relative to xs[0]; a line with no segment of positive length is one chain. */
export function xMonotoneChains(xs: ArrayLike<number>, zs: ArrayLike<number>, n = Math.min(xs.length, zs.length)): XMonotoneChains {
  const x0 = xs[0];
  const z0 = zs[0];
  // Where each chain after the first starts (a horizon has few; a plain array grows as needed).
  const starts: number[] = [];
  const dirs: number[] = [];
  let dir = UNSET;
  let px = 0;
  let pz = 0;
  for (let s = 0; s < n - 1; s++) {
    // Step 1: the segment's direction in x, on origin-relative coordinates.
    const x = xs[s + 1] - x0;
    const z = zs[s + 1] - z0;
    const d = x > px ? 1 : x < px ? -1 : z !== pz ? 0 : UNSET;
    px = x;
    pz = z;
    // Step 2: a zero-length segment (d UNSET) stays in the current chain, as does one that keeps a strict direction.
    if (d === UNSET || (d === dir && d !== 0)) continue;
    if (dir === UNSET) {
      dir = d;
      continue;
    }
    // Step 3: the direction changed (or a vertical segment): a new chain starts at segment s.
    starts.push(s);
    dirs.push(dir);
    dir = d;
  }
  return chainsFromStarts(xs, n, starts, dirs, dir);
}

/** Chains of xs[0..n) from the segments where chains 2, 3 … start, the directions of all but the last, and the last one's (UNSET = 2 becomes +1). */
export function chainsFromStarts(xs: ArrayLike<number>, n: number, starts: readonly number[], dirs: readonly number[], lastDir: number): XMonotoneChains {
  const count = n < 2 ? 0 : starts.length + 1;
  const chains: XMonotoneChains = {
    count,
    firstSegment: new Int32Array(count), lastSegment: new Int32Array(count), direction: new Int8Array(count),
    minX: new Float64Array(count), maxX: new Float64Array(count),
  };
  const x0 = xs[0];
  for (let c = 0; c < count; c++) {
    const first = c === 0 ? 0 : starts[c - 1];
    const last = c === count - 1 ? n - 2 : starts[c] - 1;
    const a = xs[first] - x0;
    const b = xs[last + 1] - x0;
    chains.firstSegment[c] = first;
    chains.lastSegment[c] = last;
    chains.direction[c] = c === count - 1 ? (lastDir === UNSET ? 1 : lastDir) : dirs[c];
    chains.minX[c] = a < b ? a : b;
    chains.maxX[c] = a < b ? b : a;
  }
  return chains;
}
