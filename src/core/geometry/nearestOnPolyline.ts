// The point of a polyline nearest to a given point: how far it is, where it lies (segment and
// fraction) and how far along the line from its first vertex. Used to tell whether a piece of a
// faulted horizon ends on a fault and to follow the fault between two cutoffs. Projection onto
// each segment, clamped to its ends (common practice in computational geometry, recalled from
// memory), computed relative to the segment's start so large map coordinates keep their digits.

/** The nearest point of a polyline: distance to it, its segment (vertex i to i + 1), fraction t in [0, 1] and distance along the line from vertex 0 (units). */
export interface PolylinePosition { distance: number; segment: number; t: number; along: number }

/** The position on xs/zs (≥ 2 vertices) nearest to (px, pz); the first nearest segment wins a tie; null for fewer than 2 vertices. */
export function nearestOnPolyline(xs: ArrayLike<number>, zs: ArrayLike<number>, px: number, pz: number): PolylinePosition | null {
  const n = Math.min(xs.length, zs.length);
  if (n < 2) return null;
  let best: PolylinePosition | null = null;
  let along = 0;
  for (let i = 0; i + 1 < n; i++) {
    const ax = xs[i], az = zs[i];
    const dx = xs[i + 1] - ax, dz = zs[i + 1] - az;
    const len2 = dx * dx + dz * dz;
    const qx = px - ax, qz = pz - az;
    const t = len2 === 0 ? 0 : Math.min(1, Math.max(0, (qx * dx + qz * dz) / len2));
    const d = Math.hypot(qx - t * dx, qz - t * dz);
    const len = Math.sqrt(len2);
    if (best === null || d < best.distance) best = { distance: d, segment: i, t, along: along + t * len };
    along += len;
  }
  return best;
}
