import type { HorizonJoin, ImagePx, ProjectDoc } from '../projectDoc';
import { updateHorizon } from './updateHorizon';

/**
 * Returns the document with the horizon's vertices (image pixels) replaced, with the given cuts by faults
 * (default none: a pasted or redrawn line is one piece); projected runs are cleared since indices no longer match.
 */
export function setHorizonPoints(doc: ProjectDoc, horizonId: string, pointsPx: ImagePx[], joins: HorizonJoin[] = []): ProjectDoc {
  return updateHorizon(doc, horizonId, (h) => ({ ...h, pointsPx: pointsPx.map(([u, v]) => [u, v]), projected: [], joins: joins.map((j) => ({ ...j })) }));
}
