import { chainCrossings } from './chainCrossings';
import { xMonotoneChains } from './xMonotoneChains';

// Where an open polyline crosses or touches itself, by monotone-chain decomposition (common
// practice in computational geometry: general-purpose geometry libraries node lines this way;
// recalled from memory, not a quoted source). The line is split into chains
// along which x strictly increases or strictly decreases (xMonotoneChains). Two segments of one
// such chain that are not neighbours have disjoint x-ranges, so a chain cannot cross itself, and
// a line that is one chain (the usual horizon) needs no pair test at all. Only chains whose
// x-ranges overlap are compared, each pair by a merge-like walk over their common x-range.
// Segments of zero length (repeated consecutive vertices) are skipped so they do not count.

/** Pairs [i, j] (i < j) of input segment indices (segment i joins vertices i and i+1) that cross or touch; at most `limit` pairs. */
export function selfIntersections(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  limit = 100,
): [number, number][] {
  const n = Math.min(xs.length, zs.length);
  if (n < 3 || limit <= 0) return [];
  return chainCrossings(xs, zs, xMonotoneChains(xs, zs, n), limit);
}
