import { sweepSelfCrossing } from './sweepSelfCrossing';

// Where an open polyline crosses itself, as a list: the test of sweepSelfCrossing (exact orientation signs;
// touches and retraced stretches are not crossings), which stops at the first crossing it finds.

/** Pairs [i, j] (i < j) of input segment indices (segment i joins vertices i and i+1) where the line crosses itself: the first one found (none when `limit` ≤ 0). */
export function selfIntersections(xs: ArrayLike<number>, zs: ArrayLike<number>, limit = 1): [number, number][] {
  if (limit <= 0) return [];
  const pair = sweepSelfCrossing(xs, zs);
  return pair ? [pair] : [];
}
