import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/**
 * Returns the document with a vertex inserted before index i (0..n); projected runs spanning the new vertex
 * grow to include it, and cuts by faults at or after i move up one (a vertex inserted at a cut ends the piece before it).
 */
export function insertVertex(doc: ProjectDoc, horizonId: string, i: number, p: ImagePx): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    if (i < 0 || i > h.pointsPx.length) return h;
    const pointsPx = h.pointsPx.slice();
    pointsPx.splice(i, 0, [p[0], p[1]]);
    // A run [a, b] with a < i <= b contains the split segment, so it keeps covering both halves.
    const projected = h.projected.map(([a, b]): [number, number] => [a >= i ? a + 1 : a, b >= i ? b + 1 : b]);
    const joins = h.joins.map((j) => (j.at >= i ? { ...j, at: j.at + 1 } : j));
    return { ...h, pointsPx, projected, joins };
  });
}
