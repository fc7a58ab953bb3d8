import type { ImagePx, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/** Returns the document with the horizon's vertices (image pixels) replaced; projected runs are cleared since indices no longer match. */
export function setHorizonPoints(doc: ProjectDoc, horizonId: string, pointsPx: ImagePx[]): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => ({ ...h, pointsPx: pointsPx.map(([u, v]) => [u, v]), projected: [] }));
}
