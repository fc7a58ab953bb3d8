import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with vertex i of the horizon at image pixel p; unchanged for an unknown horizon or index, or no move. */
export function moveVertex(doc: ProjectDoc, horizonId: string, i: number, p: ImagePx): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => {
    if (i < 0 || i >= h.pointsPx.length || (h.pointsPx[i][0] === p[0] && h.pointsPx[i][1] === p[1])) return h;
    const pointsPx = h.pointsPx.slice();
    pointsPx[i] = [p[0], p[1]];
    return { ...h, pointsPx };
  });
}
