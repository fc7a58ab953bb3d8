// Where a point meets a fault, in image pixels: the nearest point of a fault's polyline, the fault a
// click lands on (a piece end snaps onto it), and a dragged piece end kept on its fault. The nearest
// point is found by core's nearestOnPolyline (projection onto each segment, clamped to its ends).
import { nearestOnPolyline } from '../core/geometry/nearestOnPolyline';
import type { ImagePx } from '../core/model/projectDoc';

/** A fault as the tools see it: its id, whether it is shown, and its vertices (image px). */
export interface FaultLine { id: string; visible: boolean; pointsPx: readonly ImagePx[] }

/** The nearest point of a fault: the point (image px), its distance from the asked point, its segment (vertex i to i + 1) and distance along the fault. */
export interface FaultPoint { point: ImagePx; distance: number; segment: number; along: number }

/** Returns the point of the polyline nearest to p (image px), or null for fewer than 2 vertices. */
export function nearestOnFault(pointsPx: readonly ImagePx[], p: ImagePx): FaultPoint | null {
  const n = pointsPx.length;
  const us = new Float64Array(n);
  const vs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    us[i] = pointsPx[i][0];
    vs[i] = pointsPx[i][1];
  }
  const at = nearestOnPolyline(us, vs, p[0], p[1]);
  if (!at) return null;
  const i = at.segment;
  // At the segment's ends the vertex itself, so a snapped end sits exactly on a fault vertex.
  const point: ImagePx = at.t === 0 ? [us[i], vs[i]] : at.t === 1 ? [us[i + 1], vs[i + 1]]
    : [us[i] + at.t * (us[i + 1] - us[i]), vs[i] + at.t * (vs[i + 1] - vs[i])];
  return { point, distance: at.distance, segment: i, along: at.along };
}

/** Returns the shown fault nearest to p within `tolerancePx` and the point on it, or null when none is that near. */
export function snapToFault(faults: readonly FaultLine[], p: ImagePx, tolerancePx: number): { faultId: string; point: ImagePx } | null {
  let best: { faultId: string; point: ImagePx; distance: number } | null = null;
  for (const f of faults) {
    if (!f.visible) continue;
    const at = nearestOnFault(f.pointsPx, p);
    if (at && at.distance <= tolerancePx && (!best || at.distance < best.distance)) best = { faultId: f.id, point: at.point, distance: at.distance };
  }
  return best ? { faultId: best.faultId, point: best.point } : null;
}

/** Returns p moved onto the fault (its nearest point there), so a piece end dragged anywhere slides along its fault; p itself when the fault has < 2 vertices. */
export function keepOnFault(pointsPx: readonly ImagePx[], p: ImagePx): ImagePx {
  return nearestOnFault(pointsPx, p)?.point ?? p;
}

/** A piece end that is not on the fault of its join: the vertex index, the fault and how far off it is (image px). */
export interface EndOffFault { index: number; faultId: string; distancePx: number }

/**
 * Returns the piece ends farther than `tolerancePx` from the fault their join names (a fault that is missing counts
 * as off), each join giving the end of the piece before it (vertex at − 1) and the start of its piece (vertex at).
 */
export function pieceEndsOffFault(pointsPx: readonly ImagePx[], joins: readonly { at: number; faultId: string }[], faults: readonly FaultLine[], tolerancePx: number): EndOffFault[] {
  const out: EndOffFault[] = [];
  for (const j of joins) {
    const fault = faults.find((f) => f.id === j.faultId);
    for (const index of [j.at - 1, j.at]) {
      const p = pointsPx[index];
      if (!p) continue;
      const at = fault ? nearestOnFault(fault.pointsPx, p) : null;
      const distancePx = at ? at.distance : Infinity;
      if (!(distancePx <= tolerancePx)) out.push({ index, faultId: j.faultId, distancePx });
    }
  }
  return out;
}

/** Returns the index of the cutoff pair (its two points, image px) with a point nearest to p within `tolerancePx`, or -1. */
export function nearestCutoff(cutoffsPx: readonly (readonly [ImagePx, ImagePx])[], p: ImagePx, tolerancePx: number): number {
  let best = -1;
  let bestD = tolerancePx;
  cutoffsPx.forEach((pair, k) => {
    for (const q of pair) {
      const d = Math.hypot(q[0] - p[0], q[1] - p[1]);
      if (d <= bestD) {
        bestD = d;
        best = k;
      }
    }
  });
  return best;
}
