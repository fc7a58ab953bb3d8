import { nearestOnPolyline } from '../../geometry/nearestOnPolyline';
import type { DocFault, DocHorizon, ImagePx, ProjectDoc } from '../projectDoc';

/** How near (image pixels) a piece end must be to a fault to count as on it when the fault moves: the app snaps ends exactly, so this only absorbs rounding. */
export const ON_FAULT_PX = 1e-3;

/**
 * Returns the document with vertex i of the fault at image pixel p, and every piece end joined on that fault
 * which lay on one of the two segments at vertex i carried along with it (same segment, same fraction), so
 * cutoffs stay on their fault. Unchanged for an unknown fault or index, or no move.
 */
export function moveFaultVertex(doc: ProjectDoc, faultId: string, i: number, p: ImagePx): ProjectDoc {
  const k = doc.faults.findIndex((f) => f.id === faultId);
  if (k < 0) return doc;
  const old = doc.faults[k];
  if (i < 0 || i >= old.pointsPx.length || (old.pointsPx[i][0] === p[0] && old.pointsPx[i][1] === p[1])) return doc;
  const moved: DocFault = { ...old, pointsPx: old.pointsPx.map((q, j): ImagePx => (j === i ? [p[0], p[1]] : q)) };
  const faults = doc.faults.slice();
  faults[k] = moved;
  let changed = false;
  const horizons = doc.horizons.map((h) => {
    const next = carryEnds(h, old, moved, i);
    if (next !== h) changed = true;
    return next;
  });
  return { ...doc, faults, horizons: changed ? horizons : doc.horizons };
}

/** The horizon with its piece ends on `old` near vertex i placed at the same segment and fraction of `moved`; the same horizon when none moves. */
function carryEnds(h: DocHorizon, old: DocFault, moved: DocFault, i: number): DocHorizon {
  if (!h.joins.some((j) => j.faultId === old.id)) return h;
  const us = old.pointsPx.map((q) => q[0]);
  const vs = old.pointsPx.map((q) => q[1]);
  let points: ImagePx[] | null = null;
  for (const j of h.joins) {
    if (j.faultId !== old.id) continue;
    for (const e of [j.at - 1, j.at]) {
      const q = h.pointsPx[e];
      const near = nearestOnPolyline(us, vs, q[0], q[1]);
      if (!near || near.distance > ON_FAULT_PX || (near.segment !== i - 1 && near.segment !== i)) continue;
      const a = moved.pointsPx[near.segment], b = moved.pointsPx[near.segment + 1];
      points ??= h.pointsPx.slice();
      points[e] = [a[0] + near.t * (b[0] - a[0]), a[1] + near.t * (b[1] - a[1])];
    }
  }
  return points ? { ...h, pointsPx: points } : h;
}
