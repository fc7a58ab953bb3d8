import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document without vertex i of the horizon; unchanged when the horizon would keep fewer than two vertices. */
export function deleteVertex(doc: ProjectDoc, horizonId: string, i: number): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    if (i < 0 || i >= h.pointsPx.length || h.pointsPx.length <= 2) return h;
    const pointsPx = h.pointsPx.filter((_, k) => k !== i);
    const projected: [number, number][] = [];
    for (const [a, b] of h.projected) {
      const na = a > i ? a - 1 : a;
      const nb = b >= i ? b - 1 : b;
      if (nb > na) projected.push([na, nb]);
    }
    return { ...h, pointsPx, projected };
  });
}
