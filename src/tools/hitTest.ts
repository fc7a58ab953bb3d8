// Nearest-vertex and nearest-segment searches in image pixels, for tools that pick what is under the pointer.
import type { ImagePx } from '../core/model/projectDoc';

export interface SegmentHit { index: number; distance: number; point: ImagePx }

/** Returns the index of the vertex nearest to p within tol (image px), or -1. */
export function nearestVertex(points: readonly ImagePx[], p: ImagePx, tol: number): number {
  let best = -1;
  let bestD = tol * tol;
  for (let i = 0; i < points.length; i++) {
    const du = points[i][0] - p[0];
    const dv = points[i][1] - p[1];
    const d = du * du + dv * dv;
    if (d <= bestD) {
      bestD = d;
      best = i;
    }
  }
  return best;
}

/** Returns the segment (index i joins vertices i and i+1) nearest to p within tol, with the foot of the perpendicular; null if none. */
export function nearestSegment(points: readonly ImagePx[], p: ImagePx, tol: number): SegmentHit | null {
  let best: SegmentHit | null = null;
  for (let i = 0; i + 1 < points.length; i++) {
    const [au, av] = points[i];
    const [bu, bv] = points[i + 1];
    const du = bu - au;
    const dv = bv - av;
    const len2 = du * du + dv * dv;
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((p[0] - au) * du + (p[1] - av) * dv) / len2)) : 0;
    const q: ImagePx = [au + t * du, av + t * dv];
    const d = Math.hypot(p[0] - q[0], p[1] - q[1]);
    if (d <= tol && (!best || d < best.distance)) best = { index: i, distance: d, point: q };
  }
  return best;
}
