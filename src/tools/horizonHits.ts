// Which horizon vertex or segment lies under the pointer: the selected horizon first, then the others
// from the top of the list; hidden and locked horizons are never picked.
import type { DocHorizon, ImagePx, ProjectDoc } from '../core/model/projectDoc';
import { nearestSegment, nearestVertex } from './hitTest';

export type HorizonHit =
  | { kind: 'vertex'; horizon: DocHorizon; index: number }
  | { kind: 'segment'; horizon: DocHorizon; index: number; point: ImagePx };

/** Returns the editable horizons in picking order (selected first). */
export function editableHorizons(doc: ProjectDoc, selectedId: string | null): DocHorizon[] {
  const list = doc.horizons.filter((h) => h.visible && !h.locked);
  const sel = list.find((h) => h.id === selectedId);
  return sel ? [sel, ...list.filter((h) => h !== sel)] : list;
}

/** Returns the vertex (preferred) or segment under p within tol image px, or null. */
export function hitHorizon(doc: ProjectDoc, selectedId: string | null, p: ImagePx, tol: number): HorizonHit | null {
  const list = editableHorizons(doc, selectedId);
  for (const h of list) {
    const i = nearestVertex(h.pointsPx, p, tol);
    if (i >= 0) return { kind: 'vertex', horizon: h, index: i };
  }
  for (const h of list) {
    const s = nearestSegment(h.pointsPx, p, tol);
    if (s) return { kind: 'segment', horizon: h, index: s.index, point: s.point };
  }
  return null;
}
