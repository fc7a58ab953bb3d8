import type { ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with every vertex of the horizon moved by (du, dv) image pixels; unchanged for a zero move. */
export function moveHorizon(doc: ProjectDoc, horizonId: string, delta: [number, number]): ProjectDoc {
  const [du, dv] = delta;
  if (du === 0 && dv === 0) return doc;
  return updateHorizon(doc, horizonId, (h) => ({ ...h, pointsPx: h.pointsPx.map(([u, v]) => [u + du, v + dv]) }));
}
