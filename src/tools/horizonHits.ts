// Which horizon or fault vertex or segment lies under the pointer: the selected horizon first, then the
// others from the top of the list, then the faults; hidden and locked lines are never picked. Between two
// pieces of a horizon there is no segment of it (the fault joins them), so none is picked there.
import type { DocFault, DocHorizon, ImagePx, ProjectDoc } from '../core/model/projectDoc';
import { nearestSegment, nearestVertex } from './hitTest';

export type HorizonHit =
  | { kind: 'vertex'; horizon: DocHorizon; index: number }
  | { kind: 'segment'; horizon: DocHorizon; index: number; point: ImagePx };

export type FaultHit =
  | { kind: 'faultVertex'; fault: DocFault; index: number }
  | { kind: 'faultSegment'; fault: DocFault; index: number; point: ImagePx };

/** Returns the editable horizons in picking order (selected first). */
export function editableHorizons(doc: ProjectDoc, selectedId: string | null): DocHorizon[] {
  const list = doc.horizons.filter((h) => h.visible && !h.locked);
  const sel = list.find((h) => h.id === selectedId);
  return sel ? [sel, ...list.filter((h) => h !== sel)] : list;
}

/** Returns the segment of the horizon nearest to p within tol, leaving out the gaps between its pieces; null if none. */
function pieceSegment(h: DocHorizon, p: ImagePx, tol: number) {
  if (h.joins.length === 0) return nearestSegment(h.pointsPx, p, tol);
  let best: ReturnType<typeof nearestSegment> = null;
  let from = 0;
  for (const at of [...h.joins.map((j) => j.at), h.pointsPx.length]) {
    const s = nearestSegment(h.pointsPx.slice(from, at), p, tol);
    if (s && (!best || s.distance < best.distance)) best = { ...s, index: s.index + from };
    from = at;
  }
  return best;
}

/** Returns the vertex (preferred) or segment under p within tol image px, or null. */
export function hitHorizon(doc: ProjectDoc, selectedId: string | null, p: ImagePx, tol: number): HorizonHit | null {
  const list = editableHorizons(doc, selectedId);
  for (const h of list) {
    const i = nearestVertex(h.pointsPx, p, tol);
    if (i >= 0) return { kind: 'vertex', horizon: h, index: i };
  }
  for (const h of list) {
    const s = pieceSegment(h, p, tol);
    if (s) return { kind: 'segment', horizon: h, index: s.index, point: s.point };
  }
  return null;
}

/** Returns the fault vertex (preferred) or segment under p within tol image px, or null. */
export function hitFault(doc: ProjectDoc, p: ImagePx, tol: number): FaultHit | null {
  const list = doc.faults.filter((f) => f.visible && !f.locked);
  for (const f of list) {
    const i = nearestVertex(f.pointsPx, p, tol);
    if (i >= 0) return { kind: 'faultVertex', fault: f, index: i };
  }
  for (const f of list) {
    const s = nearestSegment(f.pointsPx, p, tol);
    if (s) return { kind: 'faultSegment', fault: f, index: s.index, point: s.point };
  }
  return null;
}
