import { segmentsIntersect } from './segmentsIntersect';
import type { XMonotoneChains } from './xMonotoneChains';

// The pair tests of the monotone-chain self-crossing check (see selfIntersections): only chains
// whose x-ranges overlap are compared, each pair by a merge-like walk over their common x-range,
// so a horizon that folds back in a few places costs a few short walks, not a test per segment.

/** Pairs [i, j] (i < j) of segments in different chains of xs/zs that cross or touch (neighbours: only a fold-back); at most `limit` pairs, sorted. */
export function chainCrossings(xs: ArrayLike<number>, zs: ArrayLike<number>, chains: XMonotoneChains, limit = 100): [number, number][] {
  if (chains.count < 2 || limit <= 0) return [];
  const found: [number, number][] = [];
  const ctx: PairContext = { xs, zs, x0: xs[0], z0: zs[0], chains, found, limit };
  // Sweep the chains by their left end; each unordered pair with overlapping x-ranges once.
  const order = Array.from({ length: chains.count }, (_, c) => c).sort((a, b) => chains.minX[a] - chains.minX[b] || a - b);
  for (let i = 0; i < order.length && found.length < limit; i++) {
    const a = order[i];
    for (let j = i + 1; j < order.length && found.length < limit; j++) {
      const b = order[j];
      if (chains.minX[b] > chains.maxX[a]) break;
      walkPair(ctx, a, b);
    }
  }
  return found.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
}

interface PairContext {
  xs: ArrayLike<number>;
  zs: ArrayLike<number>;
  /** Local origin (the first vertex), subtracted before each orientation test (docs/method.md §Numerics). */
  x0: number;
  z0: number;
  chains: XMonotoneChains;
  found: [number, number][];
  limit: number;
}

/** Test every segment of chain a against the segments of chain b whose x-ranges overlap it. */
function walkPair(ctx: PairContext, a: number, b: number): void {
  const { xs, x0, chains } = ctx;
  const lo = Math.max(chains.minX[a], chains.minX[b]);
  const hi = Math.min(chains.maxX[a], chains.maxX[b]);
  // Both chains are visited in increasing x, where each segment's right end does not decrease.
  let j = firstReaching(ctx, b, lo);
  for (let s = firstReaching(ctx, a, lo); s !== -1; s = nextSegment(ctx, a, s)) {
    const sLo = Math.min(xs[s] - x0, xs[s + 1] - x0);
    if (sLo > hi) break;
    const sHi = Math.max(xs[s] - x0, xs[s + 1] - x0);
    // Drop b's segments that end left of s; they end left of every later segment of a too.
    while (j !== -1 && Math.max(xs[j] - x0, xs[j + 1] - x0) < sLo) j = nextSegment(ctx, b, j);
    for (let t = j; t !== -1 && Math.min(xs[t] - x0, xs[t + 1] - x0) <= sHi; t = nextSegment(ctx, b, t)) {
      if (testPair(ctx, s, t) && ctx.found.length >= ctx.limit) return;
    }
  }
}

/** The first non-degenerate segment of chain c, in increasing x, whose right end reaches x ≥ lo (−1 if none). */
function firstReaching(ctx: PairContext, c: number, lo: number): number {
  const { xs, x0, chains } = ctx;
  const first = chains.firstSegment[c];
  const last = chains.lastSegment[c];
  if (chains.direction[c] >= 0) {
    // x increases with the index: the segment's right end is vertex s + 1.
    let l = first;
    let h = last;
    while (l < h) {
      const mid = (l + h) >> 1;
      if (xs[mid + 1] - x0 >= lo) h = mid;
      else l = mid + 1;
    }
    return realOrNext(ctx, c, l);
  }
  // x decreases with the index: increasing x runs from `last` down to `first`, right end at vertex s.
  let l = first;
  let h = last;
  while (l < h) {
    const mid = (l + h + 1) >> 1;
    if (xs[mid] - x0 >= lo) l = mid;
    else h = mid - 1;
  }
  return realOrNext(ctx, c, l);
}

/** The next non-degenerate segment of chain c after s in increasing x (−1 at the chain's end). */
function nextSegment(ctx: PairContext, c: number, s: number): number {
  const step = ctx.chains.direction[c] >= 0 ? 1 : -1;
  return realOrNext(ctx, c, s + step);
}

function realOrNext(ctx: PairContext, c: number, s: number): number {
  const { xs, zs, x0, z0, chains } = ctx;
  const step = chains.direction[c] >= 0 ? 1 : -1;
  const first = chains.firstSegment[c];
  const last = chains.lastSegment[c];
  for (let k = s; k >= first && k <= last; k += step) {
    if (xs[k] - x0 !== xs[k + 1] - x0 || zs[k] - z0 !== zs[k + 1] - z0) return k;
  }
  return -1;
}

/** Record the pair when segments s and t meet (neighbours: only when the line doubles back). */
function testPair(ctx: PairContext, s: number, t: number): boolean {
  const { xs, zs, x0, z0 } = ctx;
  const lo = s < t ? s : t;
  const hi = s < t ? t : s;
  const za = zs[lo] - z0;
  const zb = zs[lo + 1] - z0;
  const zc = zs[hi] - z0;
  const zd = zs[hi + 1] - z0;
  // Quick reject on the z-ranges (the x-ranges overlap by construction).
  if ((zc > zd ? zc : zd) < (za < zb ? za : zb) || (zc < zd ? zc : zd) > (za > zb ? za : zb)) return false;
  let meets: boolean;
  if (neighbours(ctx, lo, hi)) {
    // Neighbours share vertex hi; they meet elsewhere only if the line doubles back on itself.
    const ax = xs[lo] - x0 - (xs[hi] - x0);
    const az = zs[lo] - z0 - (zs[hi] - z0);
    const dx = xs[hi + 1] - x0 - (xs[hi] - x0);
    const dz = zs[hi + 1] - z0 - (zs[hi] - z0);
    meets = ax * dz - az * dx === 0 && ax * dx + az * dz > 0;
  } else {
    meets = segmentsIntersect(
      xs[lo] - x0, zs[lo] - z0, xs[lo + 1] - x0, zs[lo + 1] - z0,
      xs[hi] - x0, zs[hi] - z0, xs[hi + 1] - x0, zs[hi + 1] - z0,
    );
  }
  if (meets) ctx.found.push([lo, hi]);
  return meets;
}

/** True when only zero-length segments lie between segments lo < hi (they share a vertex). */
function neighbours(ctx: PairContext, lo: number, hi: number): boolean {
  const { xs, zs, x0, z0 } = ctx;
  for (let k = lo + 1; k < hi; k++) {
    if (xs[k] - x0 !== xs[k + 1] - x0 || zs[k] - z0 !== zs[k + 1] - z0) return false;
  }
  return true;
}
