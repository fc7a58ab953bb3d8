import { nearestOnPolyline } from '../../geometry/nearestOnPolyline';
import type { DocFault, ImagePx, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** The point of the fault (image pixels) nearest to q. */
function onFault(f: DocFault, q: ImagePx): ImagePx {
  const near = nearestOnPolyline(f.pointsPx.map((p) => p[0]), f.pointsPx.map((p) => p[1]), q[0], q[1]);
  if (!near) return q;
  const a = f.pointsPx[near.segment], b = f.pointsPx[near.segment + 1];
  return [a[0] + near.t * (b[0] - a[0]), a[1] + near.t * (b[1] - a[1])];
}

/**
 * Returns the document with the horizon cut at vertex `at` by the fault: a new piece starts at `at`, joined to
 * the piece before along the fault. With `snap`, the two piece ends (vertices at − 1 and at) are moved onto
 * the nearest points of the fault. Unchanged for an unknown horizon or fault, a fault of fewer than two
 * vertices, a cut already there, or one that would leave a piece of fewer than two vertices.
 */
export function addJoin(doc: ProjectDoc, horizonId: string, at: number, faultId: string, snap = false): ProjectDoc {
  const fault = doc.faults.find((f) => f.id === faultId);
  if (!fault || fault.pointsPx.length < 2 || !Number.isInteger(at)) return doc;
  return updateHorizon(doc, horizonId, (h) => {
    const before = h.joins.filter((j) => j.at < at);
    const after = h.joins.filter((j) => j.at > at);
    const lo = before.length ? before[before.length - 1].at : 0;
    const hi = after.length ? after[0].at : h.pointsPx.length;
    if (h.joins.some((j) => j.at === at) || at - lo < 2 || hi - at < 2) return h;
    const joins = [...before, { at, faultId }, ...after];
    if (!snap) return { ...h, joins };
    const pointsPx = h.pointsPx.slice();
    pointsPx[at - 1] = onFault(fault, pointsPx[at - 1]);
    pointsPx[at] = onFault(fault, pointsPx[at]);
    return { ...h, joins, pointsPx };
  });
}
