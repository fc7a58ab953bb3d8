import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/**
 * Returns the document without vertex i of the horizon; cuts by faults after i move down one. Unchanged when the
 * horizon, or the piece the vertex belongs to, would keep fewer than two vertices.
 */
export function deleteVertex(doc: ProjectDoc, horizonId: string, i: number): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    if (i < 0 || i >= h.pointsPx.length || h.pointsPx.length <= 2) return h;
    const starts = [0, ...h.joins.map((j) => j.at), h.pointsPx.length];
    for (let k = 0; k + 1 < starts.length; k++) if (i >= starts[k] && i < starts[k + 1] && starts[k + 1] - starts[k] <= 2) return h;
    const pointsPx = h.pointsPx.filter((_, k) => k !== i);
    const projected: [number, number][] = [];
    for (const [a, b] of h.projected) {
      const na = a > i ? a - 1 : a;
      const nb = b >= i ? b - 1 : b;
      if (nb > na) projected.push([na, nb]);
    }
    const joins = h.joins.map((j) => (j.at > i ? { ...j, at: j.at - 1 } : j));
    return { ...h, pointsPx, projected, joins };
  });
}
